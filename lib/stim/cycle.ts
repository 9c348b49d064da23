import type { ChannelSettings } from "./schema";

export type CycleSettings = Pick<ChannelSettings, "rampUpS" | "holdS" | "rampDownS" | "restS">;

/** The on/off envelope. Times in seconds (s); ratios and shares are plain numbers. */
export interface CycleDerived {
  /** Ramp-up + hold + ramp-down + rest, s. */
  cycleLengthS: number;
  /** On time counting the ramps (ramp-up + hold + ramp-down), s. */
  onTimeWithRampsS: number;
  /** On time at full intensity only (the hold), s. */
  onTimeHoldOnlyS: number;
  /** x in "on : rest = 1 : x" with the on time counting the ramps; null when that on time is zero. */
  restPerOnWithRamps: number | null;
  /** x in "on : rest = 1 : x" with the on time as the hold only; null when the hold is zero. */
  restPerOnHoldOnly: number | null;
  /** hold / (hold + rest): the ramps left out of the cycle altogether; null when hold + rest is zero. */
  onShareRampsIgnored: number | null;
  /** (ramp-up + hold + ramp-down) / cycle: the ramps counted as on time; null when the cycle is zero. */
  onShareRampsAsOn: number | null;
}

const ratio = (a: number, b: number): number | null => (b > 0 ? a / b : null);

export function onTimeWithRampsS(c: CycleSettings): number {
  return c.rampUpS + c.holdS + c.rampDownS;
}

export function cycleLengthS(c: CycleSettings): number {
  return onTimeWithRampsS(c) + c.restS;
}

export function deriveCycle(c: CycleSettings): CycleDerived {
  const on = onTimeWithRampsS(c);
  return {
    cycleLengthS: on + c.restS,
    onTimeWithRampsS: on,
    onTimeHoldOnlyS: c.holdS,
    restPerOnWithRamps: ratio(c.restS, on),
    restPerOnHoldOnly: ratio(c.restS, c.holdS),
    onShareRampsIgnored: ratio(c.holdS, c.holdS + c.restS),
    onShareRampsAsOn: ratio(on, on + c.restS),
  };
}

/**
 * r.m.s. current averaged over an on/off cycle, in the unit of `trainRmsMa`: I_rms·sqrt(on/(on+rest)).
 * Null when on + rest is zero. Which on time to pass is the caller's convention; see DEVELOPERS.md (lib/stim).
 */
export function cycleAveragedRmsMa(trainRmsMa: number, onS: number, restS: number): number | null {
  const share = ratio(onS, onS + restS);
  return share === null ? null : trainRmsMa * Math.sqrt(share);
}
