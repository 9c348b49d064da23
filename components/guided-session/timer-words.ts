import type { ChannelTimerState, SessionPhase } from "@/lib/session-timer";
import { minutesAndSeconds, secondsToShow } from "@/lib/session-timer";

// The words and signs the timer shows. Every phase has a word and its own sign, so none depends on colour, and
// the signs echo the ribbon's shape: rising, flat, falling, off.
export const PHASE_SIGNS: Record<SessionPhase, { word: string; icon: string }> = {
  "ramp-up": { word: "Ramp up", icon: "↗" },
  hold: { word: "Hold", icon: "━" },
  "ramp-down": { word: "Ramp down", icon: "↘" },
  rest: { word: "Rest", icon: "○" },
};

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** "29 min 52 s", shown on screen (read aloud well too: screen readers expand min and s). */
export function shortDuration(seconds: number): string {
  const { minutes, seconds: secs } = minutesAndSeconds(seconds);
  if (minutes === 0) return `${secs} s`;
  return secs === 0 ? `${minutes} min` : `${minutes} min ${secs} s`;
}

export function secondsInWords(seconds: number): string {
  return plural(secondsToShow(seconds), "second", "seconds");
}

/**
 * What the polite live region says. It depends only on the phase and the cycle, not on the seconds left, so the
 * region's text changes (and is read out) once per phase, never every second. The cycle number is said as each
 * cycle opens, which also keeps two consecutive messages from being identical.
 */
export function phaseAnnouncement(state: ChannelTimerState, opensCycle: boolean, prefix = ""): string {
  const sign = PHASE_SIGNS[state.phase];
  if (state.continuous) return `${prefix}${sign.word} for the rest of the session.`;
  const cycle = opensCycle ? `Cycle ${state.cycle}. ` : "";
  return `${prefix}${cycle}${sign.word}, ${secondsInWords(state.phaseSeconds)}.`;
}

/** True when this phase is the first of its cycle (a cycle may open on the hold when there is no ramp-up). */
export function opensCycle(state: ChannelTimerState): boolean {
  return Math.round((state.secondsIntoCycle - state.secondsIntoPhase) * 1000) === 0;
}
