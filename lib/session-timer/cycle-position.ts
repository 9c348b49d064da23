import type { CycleSettings } from "@/lib/stim";

// Where one channel's on/off cycle has reached, a given number of seconds into a session. Pure: the same elapsed
// time always gives the same answer, so a clock that is read rather than counted cannot drift.

export type SessionPhase = "ramp-up" | "hold" | "ramp-down" | "rest";

export const SESSION_PHASES: readonly SessionPhase[] = ["ramp-up", "hold", "ramp-down", "rest"];

export type ChannelTimerState = {
  phase: SessionPhase;
  /** The phase's own length in seconds (what an announcement of the phase says). */
  phaseSeconds: number;
  /** Seconds since this phase began. */
  secondsIntoPhase: number;
  /** Seconds to the end of this phase, or to the end of the session when that comes first. */
  phaseSecondsLeft: number;
  /** 1-based: the first cycle is cycle 1. */
  cycle: number;
  /** Seconds into the current cycle: `CycleRibbon`'s `progressSeconds` with `cycles={1}`. */
  secondsIntoCycle: number;
  cycleSeconds: number;
  /** Elapsed time held to the session: never below 0 or beyond its end. */
  elapsedSeconds: number;
  sessionSeconds: number;
  sessionSecondsLeft: number;
  over: boolean;
  /**
   * The stimulation never changes phase: no ramps and no rest (one unbroken hold), or, never publishable, a cycle of
   * no length at all (shown as one long rest). The phase then lasts the whole session.
   */
  continuous: boolean;
};

// Whole milliseconds: settings such as 0.1 s and 0.2 s then add up to exactly 0.3 s, so a boundary never lands a
// hair to one side of where the therapist set it.
const toMs = (seconds: number) => Math.round(seconds * 1000);

function phaseLengthsMs(cycle: CycleSettings): Array<[SessionPhase, number]> {
  return [
    ["ramp-up", toMs(cycle.rampUpS)],
    ["hold", toMs(cycle.holdS)],
    ["ramp-down", toMs(cycle.rampDownS)],
    ["rest", toMs(cycle.restS)],
  ];
}

/**
 * Finds the phase at `positionMs` into a cycle. Phases run from their start up to, not including, their end, so
 * the moment a hold ends is already the ramp-down; with `endInclusive` (the moment the session ends) the phase that
 * was running up to that moment is the one reported instead. Phases of no length are never reported.
 */
function locate(lengths: Array<[SessionPhase, number]>, positionMs: number, endInclusive: boolean) {
  let startMs = 0;
  let last: { phase: SessionPhase; startMs: number; lengthMs: number } | null = null;
  for (const [phase, lengthMs] of lengths) {
    if (lengthMs <= 0) continue;
    const endMs = startMs + lengthMs;
    last = { phase, startMs, lengthMs };
    if (endInclusive ? positionMs <= endMs : positionMs < endMs) return last;
    startMs = endMs;
  }
  // Only reached by rounding at the very end of the cycle: the last phase with a length.
  return last;
}

// At the session's end, the cycle that was running up to it, not the next one that would start at that moment.
const cycleIndexAt = (elapsedMs: number, cycleMs: number, over: boolean) =>
  over && elapsedMs > 0 ? Math.ceil(elapsedMs / cycleMs) - 1 : Math.floor(elapsedMs / cycleMs);

export function channelTimerState(cycle: CycleSettings, minutesPerSession: number, elapsedSeconds: number): ChannelTimerState {
  const sessionMs = toMs(minutesPerSession * 60);
  const elapsedMs = Math.min(Math.max(elapsedSeconds * 1000, 0), sessionMs);
  const over = elapsedMs >= sessionMs;
  const lengths = phaseLengthsMs(cycle);
  const cycleMs = lengths.reduce((sum, [, ms]) => sum + ms, 0);
  const holdMs = lengths[1]![1];
  const sessionLeftMs = sessionMs - elapsedMs;
  const common = {
    elapsedSeconds: elapsedMs / 1000,
    sessionSeconds: sessionMs / 1000,
    sessionSecondsLeft: sessionLeftMs / 1000,
    cycleSeconds: cycleMs / 1000,
    over,
  };

  if (cycleMs <= 0 || holdMs === cycleMs) {
    const index = cycleMs > 0 ? cycleIndexAt(elapsedMs, cycleMs, over) : 0;
    return {
      ...common,
      phase: cycleMs > 0 ? "hold" : "rest",
      phaseSeconds: sessionMs / 1000,
      secondsIntoPhase: elapsedMs / 1000,
      phaseSecondsLeft: sessionLeftMs / 1000,
      cycle: index + 1,
      secondsIntoCycle: cycleMs > 0 ? (elapsedMs - index * cycleMs) / 1000 : 0,
      continuous: true,
    };
  }

  const cycleIndex = cycleIndexAt(elapsedMs, cycleMs, over);
  const positionMs = elapsedMs - cycleIndex * cycleMs;
  const found = locate(lengths, positionMs, over)!;
  const phaseLeftMs = found.startMs + found.lengthMs - positionMs;
  return {
    ...common,
    phase: found.phase,
    phaseSeconds: found.lengthMs / 1000,
    secondsIntoPhase: (positionMs - found.startMs) / 1000,
    phaseSecondsLeft: Math.min(phaseLeftMs, sessionLeftMs) / 1000,
    cycle: cycleIndex + 1,
    secondsIntoCycle: positionMs / 1000,
    continuous: false,
  };
}
