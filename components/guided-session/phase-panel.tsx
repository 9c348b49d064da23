import type { ChannelTimerState } from "@/lib/session-timer";
import { secondsToShow } from "@/lib/session-timer";
import { PHASE_SIGNS } from "./timer-words";

// The phase in very large type with its sign, and the seconds left in it. The polite live region elsewhere says
// each change of phase once; this panel, which changes every second, is not announced as it changes.
// role="timer" is a live region that is silent by default (aria-live off), which is what this needs: found and
// read on request, never read out by itself.
export type TimerMode = "ready" | "running" | "paused";

export function PhasePanel({
  state,
  mode,
  label,
  size = "large",
}: {
  state: ChannelTimerState;
  mode: TimerMode;
  label: string;
  size?: "large" | "small";
}) {
  const large = size === "large";
  // Before the start the panel says so, rather than showing a first phase that looks as if it were running.
  const sign = mode === "ready" ? { icon: "▷", word: "Ready" } : PHASE_SIGNS[state.phase];
  const left = secondsToShow(state.phaseSecondsLeft);
  return (
    <div role="timer" aria-label={label} className="flex flex-col gap-1">
      <p className={`flex items-center gap-2 font-bold leading-none ${large ? "text-[2.75rem] sm:text-6xl" : "text-3xl"}`}>
        <span aria-hidden className="inline-block w-[1em] shrink-0 text-center">
          {sign.icon}
        </span>
        <span>{sign.word}</span>
      </p>
      {mode === "ready" ? (
        <p className={large ? "text-2xl" : "text-lg"}>Starts with {PHASE_SIGNS[state.phase].word.toLowerCase()}</p>
      ) : state.continuous ? (
        <p className={large ? "text-2xl" : "text-lg"}>for the whole session</p>
      ) : (
        <p className={`tabular-nums ${large ? "text-3xl" : "text-lg"}`}>
          <span className="font-bold">{left} s</span> left in this phase
        </p>
      )}
      {mode === "paused" ? (
        <p className={`mt-2 flex items-center gap-2 font-bold ${large ? "text-2xl" : "text-lg"}`}>
          <span aria-hidden>⏸</span> Paused
        </p>
      ) : null}
    </div>
  );
}
