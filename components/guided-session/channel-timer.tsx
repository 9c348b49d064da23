import { CycleRibbon } from "@/components/stim-picture";
import type { ChannelTimerState } from "@/lib/session-timer";
import type { ReactNode } from "react";
import type { CycleSettings } from "@/lib/stim";
import { PhasePanel, type TimerMode } from "./phase-panel";

// One channel's timer: the phase, the cycle ribbon filling as the cycle runs, and the cycle number. With reduced
// motion asked for, the fill moves in whole-second steps instead of sliding.
//
// The ribbon is hidden from screen readers here: the timer's own words already say the phase, the seconds and the
// cycle, and the drawing's description (rewritten on every tick) would repeat them. Drawn for one cycle, it labels
// that cycle "Cycle 1" whatever the number, so that label is hidden (the first <g> of the SVG, checked by
// tests/unit/session-timer/render.test.tsx) and the real number is written below it. Its screen-reader table is
// absolutely positioned and wider than a phone; the relative, overflow-hidden wrapper keeps it from widening the page.
export const RIBBON_WRAPPER = "relative overflow-hidden [&_svg>g:first-of-type]:hidden";
export function ChannelTimer({
  label,
  cycle,
  state,
  mode,
  reducedMotion,
  size = "large",
  aside,
}: {
  label: string;
  cycle: CycleSettings;
  state: ChannelTimerState;
  mode: TimerMode;
  reducedMotion: boolean;
  size?: "large" | "small";
  /** Shown on the cycle's line, e.g. the session time left. */
  aside?: ReactNode;
}) {
  const progress = reducedMotion ? Math.floor(state.secondsIntoCycle) : state.secondsIntoCycle;
  const large = size === "large";
  return (
    <div className="flex flex-col gap-3">
      <PhasePanel state={state} mode={mode} label={`${label}: phase`} size={size} />
      <div aria-hidden className={`${RIBBON_WRAPPER} ${large ? "" : "max-w-sm"}`}>
        <CycleRibbon
          {...cycle}
          cycles={1}
          progressSeconds={progress}
          layout={large ? "responsive" : "narrow"}
          table="sr-only"
          title={`${label}: one cycle, filled to where it has reached`}
        />
      </div>
      <div className={`flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1 tabular-nums ${large ? "text-xl" : "text-base"}`}>
        {state.continuous ? null : <p>Cycle {state.cycle}</p>}
        {aside}
      </div>
    </div>
  );
}
