import type { RedFlagClearance, Screening } from "@/db/schema";
import { OUTCOME_LABELS, redFlagLabel, type Outcome } from "./questions";
import { allConcerns, type AnswersDraft, type Concern } from "./rules";

// What the screens, the routes and the publishing gate show of one signed screening. Pure, so it is unit-tested
// without a database. Concerns are worked out from the stored answers by the rules in lib/screening/rules.ts; the
// audit event of the signing keeps the red flags and concern codes as they were at the time.

export type ClearanceView = {
  id: string;
  flag: string;
  clinicianName: string;
  note: string;
  recordedAt: Date;
  recordedByName: string;
};

export type RedFlagView = { id: string; label: string; clearance: ClearanceView | null };

export type ScreeningSummary = {
  id: string;
  clientId: string;
  version: number;
  outcome: Outcome;
  outcomeLabel: string;
  rescreenOn: string | null;
  signedAt: Date;
  signedById: string;
  signedByName: string;
  redFlags: RedFlagView[];
  concerns: Concern[];
};

type ClearanceRow = { clearance: RedFlagClearance; recordedByName: string };

export function summariseScreening(row: { screening: Screening; signedByName: string }, clearances: ClearanceRow[]): ScreeningSummary {
  const { screening } = row;
  const mine = clearances.filter((c) => c.clearance.screeningId === screening.id);
  return {
    id: screening.id,
    clientId: screening.clientId,
    version: screening.version,
    outcome: screening.outcome,
    outcomeLabel: OUTCOME_LABELS[screening.outcome],
    rescreenOn: screening.rescreenOn,
    signedAt: screening.signedAt,
    signedById: screening.signedById,
    signedByName: row.signedByName,
    redFlags: screening.redFlags.map((flag) => {
      const found = mine.find((c) => c.clearance.flag === flag);
      return {
        id: flag,
        label: redFlagLabel(flag),
        clearance: found
          ? {
              id: found.clearance.id,
              flag,
              clinicianName: found.clearance.clinicianName,
              note: found.clearance.note,
              recordedAt: found.clearance.recordedAt,
              recordedByName: found.recordedByName,
            }
          : null,
      };
    }),
    // Only the signing command writes this column, always with answers parsed by signScreeningSchema; the rules
    // take a loose shape anyway, so an answer missing from an older record reads as "not recorded".
    concerns: allConcerns(screening.answers as AnswersDraft),
  };
}

export const GATE_NO_SCREENING = "Sign a screening before publishing.";

// Why the latest screening stops a programme being published, one reason per problem, in words for the screen.
export function gateReasons(latest: ScreeningSummary | null): string[] {
  if (!latest) return [GATE_NO_SCREENING];
  const reasons: string[] = [];
  if (latest.outcome === "not-eligible") {
    reasons.push(`The latest screening (version ${latest.version}) records the client as not eligible: sign a new screening before publishing.`);
  }
  for (const flag of latest.redFlags) {
    if (!flag.clearance) reasons.push(`${flag.label}: record a named clinician's clearance before publishing.`);
  }
  return reasons;
}
