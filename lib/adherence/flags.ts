import type { Measure, PeriodAdherence } from "./measure";

// Helpers for the flag rules and the screens. A threshold is compared with a relative allowance of 1e-9 for
// floating-point rounding, as lib/stim does, so a figure exactly at a threshold is not taken as below it.
const ALLOWANCE = 1e-9;
export const UNDER_HALF = 0.5;

export type AdherenceMeasure = "sessions" | "minutes" | "either";

const below = (m: Measure, threshold: number) => m.ratio !== null && m.ratio < threshold * (1 - ALLOWANCE);

/**
 * Under half of what was prescribed. By default either count will do: every session done but cut short, and the
 * minutes crammed into too few sessions, both deserve the therapist's look. Nothing prescribed is never under half.
 */
export function isUnderHalf(result: Pick<PeriodAdherence, "sessions" | "minutes">, by: AdherenceMeasure = "either"): boolean {
  if (by === "either") return below(result.sessions, UNDER_HALF) || below(result.minutes, UNDER_HALF);
  return below(result[by], UNDER_HALF);
}

/**
 * A whole percentage to show, at most 100, rounded down so that 79.6 % never reads as an 80 % cut-off met.
 * null when nothing was prescribed: show "nothing prescribed", not 0 %.
 */
export function percentForDisplay(m: Measure): number | null {
  return m.cappedPercent === null ? null : Math.floor(m.cappedPercent * (1 + ALLOWANCE));
}
