import { generalConcerns, redFlagsPresent } from "./general-rules";
import { OUTCOME_LABELS, redFlagLabel } from "./questions";
import type { AnswersDraft, Concern } from "./rule-types";
import { siteConcerns } from "./site-rules";

// Answers that contradict one another, refused at signing with a message on the field to change. These are
// common practice (no published source): they keep the signed record coherent, and they never choose the outcome
// for the therapist; they only refuse an outcome the therapist's own answers rule out.

export type ConsistencyProblem = { code: string; path: (string | number)[]; message: string };

export function concernText(concern: Concern): string {
  return concern.site ? `${concern.site.name}: ${concern.title.toLowerCase()}` : concern.title;
}

function listed(items: string[], max = 3): string {
  const shown = items.slice(0, max);
  const more = items.length - shown.length;
  return more > 0 ? `${shown.join("; ")}; and ${more} more` : shown.join("; ");
}

// Sites where every answer is clear do not count; sites with at least one "do not place electrodes here" do.
export function blockingSites(answers: AnswersDraft): number[] {
  const blocked = new Set(siteConcerns(answers).filter((c) => c.level === "do-not-place").map((c) => c.site!.index));
  return [...blocked];
}

export function consistencyProblems(answers: AnswersDraft): ConsistencyProblem[] {
  const problems: ConsistencyProblem[] = [];
  const result = answers.outcome?.result;
  const sites = answers.sites ?? [];
  const precautions = "“Eligible with precautions”";
  const notEligible = `“${OUTCOME_LABELS["not-eligible"]}”`;

  if (result && result !== "not-eligible" && sites.length > 0 && blockingSites(answers).length === sites.length) {
    problems.push({
      code: "no-usable-site",
      path: ["outcome", "result"],
      message: `Every electrode site has a reason not to place electrodes there. Choose ${notEligible}, or add the site you will use.`,
    });
  } else if (result === "eligible") {
    const reasons = [
      ...redFlagsPresent(answers).map(redFlagLabel),
      ...[...siteConcerns(answers), ...generalConcerns(answers)].filter((c) => c.level !== "note").map(concernText),
    ];
    if (reasons.length > 0) {
      problems.push({
        code: "eligible-with-concerns",
        path: ["outcome", "result"],
        message: `This screening records ${listed(reasons)}. Choose ${precautions} or ${notEligible}.`,
      });
    }
  }

  const appliedBy = answers.context?.appliedBy;
  if ((appliedBy === "carer" || appliedBy === "both") && answers.capacity?.carerCompetence === "no-carer") {
    problems.push({
      code: "carer-applies-but-none",
      path: ["capacity", "carerCompetence"],
      message: "Section A says a carer applies the electrodes: say whether that carer can do it safely yet.",
    });
  }

  if (answers.redFlags?.noReliableFeedback === "yes" && answers.capacity?.carerCompetence === "competent") {
    problems.push({
      code: "capable-carer-contradiction",
      path: ["redFlags", "noReliableFeedback"],
      message: "Section D records a carer who can apply the electrodes safely: check whether there really is no capable carer.",
    });
  }
  return problems;
}
