import { RED_FLAGS, type RedFlagId } from "./questions";
import type { AnswersDraft, Concern, Rule } from "./rule-types";
import { SCREENING_SOURCES as S } from "./sources";

// Answers beyond the electrode sites: the systemic red flags (section B), capacity to self-manage (D) and the
// in-clinic test stimulation (E).

export function redFlagsPresent(answers: AnswersDraft): RedFlagId[] {
  return RED_FLAGS.filter((flag) => answers.redFlags?.[flag.key] === "yes").map((flag) => flag.id);
}

const carerApplies = (answers: AnswersDraft) => answers.context?.appliedBy === "carer" || answers.context?.appliedBy === "both";

export const GENERAL_RULES: Rule<AnswersDraft>[] = [
  {
    code: "understanding-limited",
    level: "precaution",
    applies: (a) => a.capacity?.understanding === "no",
    title: "The client may not understand safe use or when to stop",
    detail: "Home use needs a carer who does, or closer supervision.",
    source: S.commonPractice,
  },
  {
    code: "dexterity-limited",
    level: "precaution",
    applies: (a) => a.capacity?.dexterity === "no" && a.context?.appliedBy === "client",
    title: "The client applies the electrodes alone but lacks the dexterity to",
    detail: "Poorly placed or lifting electrodes concentrate the current.",
    source: S.commonPractice,
  },
  {
    code: "carer-not-yet-competent",
    level: "precaution",
    applies: (a) => carerApplies(a) && a.capacity?.carerCompetence === "not-yet",
    title: "The carer who applies the electrodes cannot do so safely yet",
    detail: "Train and check the carer before home sessions start.",
    source: S.commonPractice,
  },
  {
    code: "test-not-done",
    level: "precaution",
    applies: (a) => a.testStimulation?.done === "no",
    title: "No test stimulation in clinic",
    detail: "The first home session would be the client's first stimulation.",
    source: S.commonPractice,
  },
  {
    code: "test-not-tolerated",
    level: "precaution",
    applies: (a) => a.testStimulation?.done === "yes" && a.testStimulation.tolerance === "not-tolerated",
    title: "The test stimulation was not tolerated",
    detail: "Home sessions at the same settings are unlikely to be tolerated either.",
    source: S.commonPractice,
  },
  {
    code: "test-skin-reaction",
    level: "precaution",
    applies: (a) =>
      a.testStimulation?.done === "yes" && (a.testStimulation.skinAfter === "redness-beyond" || a.testStimulation.skinAfter === "damage"),
    title: "The skin reacted to the test stimulation",
    detail: "More than faint pinkness within the electrode outline needs the therapist's attention.",
    source: S.skinRuleOfThumb,
  },
  {
    code: "test-no-contraction",
    level: "note",
    applies: (a) => a.testStimulation?.done === "yes" && a.testStimulation.movement === "none",
    title: "No visible contraction in the test",
    detail: "Recorded for information: it is about the effect, not safety.",
    source: S.commonPractice,
  },
];

export function generalConcerns(answers: AnswersDraft): Concern[] {
  return GENERAL_RULES.filter((rule) => rule.applies(answers)).map((rule) => ({
    code: rule.code,
    level: rule.level,
    title: rule.title,
    detail: rule.detail,
    source: rule.source,
  }));
}
