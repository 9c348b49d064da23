import { cycleLengthS, onTimeWithRampsS, type CycleSettings } from "./cycle";
import type { ChannelSettings } from "./schema";

export type SessionSettings = CycleSettings &
  Pick<ChannelSettings, "sessionMinutes" | "sessionsPerDay" | "daysPerWeek">;

/**
 * What one session and one week deliver, assuming each session starts with a ramp-up and runs whole cycles
 * until the session time ends (a cycle cut short by the end counts for the part that ran).
 */
export interface SessionDerived {
  sessionsPerWeek: number;
  /** Complete contractions (ramp-up, hold and ramp-down all finished) per session. */
  contractionsPerSession: number;
  /** Minutes with any current flowing (ramps included), per session. */
  stimulatedMinutesPerSession: number;
  /** Minutes at the set amplitude (hold only), per session. */
  fullIntensityMinutesPerSession: number;
  fullIntensityMinutesPerWeek: number;
  /** Share of the session with current flowing, 0–1 (ramps counted). */
  stimulatedShareOfSession: number;
  /** Share of the session at the set amplitude, 0–1. */
  fullIntensityShareOfSession: number;
}

// Guards floor() against a quotient such as 149.99999999 that is really 150.
const floorCount = (x: number): number => Math.floor(x + 1e-9);

export function deriveSession(s: SessionSettings): SessionDerived {
  const sessionS = s.sessionMinutes * 60;
  const sessionsPerWeek = s.sessionsPerDay * s.daysPerWeek;
  const on = onTimeWithRampsS(s);
  const cycle = cycleLengthS(s);
  let contractions = 0;
  let stimulatedS = 0;
  let fullS = 0;
  if (on > 0) {
    const whole = floorCount(sessionS / cycle);
    const remainder = Math.max(0, sessionS - whole * cycle);
    contractions = floorCount((sessionS + s.restS) / cycle);
    stimulatedS = whole * on + Math.min(remainder, on);
    fullS = whole * s.holdS + Math.min(Math.max(remainder - s.rampUpS, 0), s.holdS);
  }
  return {
    sessionsPerWeek,
    contractionsPerSession: contractions,
    stimulatedMinutesPerSession: stimulatedS / 60,
    fullIntensityMinutesPerSession: fullS / 60,
    fullIntensityMinutesPerWeek: (fullS / 60) * sessionsPerWeek,
    stimulatedShareOfSession: stimulatedS / sessionS,
    fullIntensityShareOfSession: fullS / sessionS,
  };
}
