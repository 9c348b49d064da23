import { generalConcerns } from "./general-rules";
import type { AnswersDraft, Concern } from "./rule-types";
import { siteConcerns } from "./site-rules";

// The screening rules in one import: which systemic red flags are present, which answers are concerns (per site and
// overall) and whether the outcome agrees with them. All pure; the form's summary runs them on a half-filled form,
// the signing command on the parsed answers. Rampline records and points out; the therapist decides.

export { redFlagsPresent, generalConcerns, GENERAL_RULES } from "./general-rules";
export { siteConcerns, SITE_RULES } from "./site-rules";
export { blockingSites, concernText, consistencyProblems, type ConsistencyProblem } from "./consistency";
export type { AnswersDraft, Concern, ConcernCode, ConcernLevel } from "./rule-types";

const LEVEL_ORDER = { "do-not-place": 0, precaution: 1, note: 2 } as const;

// Every concern, the strongest first; within a level, sites in form order, then the rest.
export function allConcerns(answers: AnswersDraft): Concern[] {
  const concerns = [...siteConcerns(answers), ...generalConcerns(answers)];
  return concerns
    .map((concern, order) => ({ concern, order }))
    .sort((a, b) => LEVEL_ORDER[a.concern.level] - LEVEL_ORDER[b.concern.level] || a.order - b.order)
    .map(({ concern }) => concern);
}
