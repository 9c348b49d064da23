// No "use client": the handout renders this on the server, the builder and the timer in the browser.
import { CYCLE_PARTS, cycleSeconds, partDurationS, type CycleTimes } from "./cycle-geometry";
import { CycleRibbonSvg } from "./cycle-ribbon-svg";
import { describeCycle, PART_NAMES } from "./cycle-text";
import { formatFigure } from "./format";
import { NARROW_VIEW, RESPONSIVE_CLASSES, WIDE_VIEW } from "./svg-text";

export type CycleRibbonProps = CycleTimes & {
  /** How many cycles to draw side by side; two show the rest running into the next ramp-up. */
  cycles?: number;
  /** Fills the ribbon from time 0 up to here, in seconds (the session timer); unfilled when left out. */
  progressSeconds?: number;
  title?: string;
  /** The table of the same figures: visible by default, or for screen readers only where space is short. */
  table?: "visible" | "sr-only";
  /** "responsive" (default) draws a narrow layout on phones and a wide one from `sm` up; or force one. */
  layout?: "responsive" | "wide" | "narrow";
};

const cell = "px-2 py-1 text-left";

// Rampline's signature drawing: the on/off envelope as a ribbon, to scale in seconds, with its table.
export function CycleRibbon({ cycles = 2, progressSeconds, title = "The on/off cycle, to scale", table = "visible", layout = "responsive", ...t }: CycleRibbonProps) {
  const times: CycleTimes = { rampUpS: t.rampUpS, holdS: t.holdS, rampDownS: t.rampDownS, restS: t.restS };
  const drawing = { times, cycles, progressSeconds, title, description: describeCycle(times, cycles, progressSeconds) };
  return (
    <figure className="flex flex-col gap-2">
      {layout !== "narrow" ? (
        <CycleRibbonSvg {...drawing} width={WIDE_VIEW} className={layout === "responsive" ? RESPONSIVE_CLASSES.wide : ""} />
      ) : null}
      {layout !== "wide" ? (
        <CycleRibbonSvg {...drawing} width={NARROW_VIEW} className={layout === "responsive" ? RESPONSIVE_CLASSES.narrow : ""} />
      ) : null}
      <table className={table === "sr-only" ? "sr-only" : "w-full text-sm tabular-nums"}>
        <caption className="text-left text-ink-soft">Seconds in each part of one cycle</caption>
        <thead>
          <tr>
            {CYCLE_PARTS.map((part) => (
              <th key={part} scope="col" className={`border-b border-line ${cell}`}>
                {PART_NAMES[part]}
              </th>
            ))}
            <th scope="col" className={`border-b border-line ${cell}`}>
              Whole cycle
            </th>
          </tr>
        </thead>
        <tbody>
          <tr>
            {CYCLE_PARTS.map((part) => (
              <td key={part} className={cell}>
                {formatFigure(partDurationS(times, part), { maxFractionDigits: 2 })}
              </td>
            ))}
            <td className={`${cell} font-bold`}>{formatFigure(cycleSeconds(times), { maxFractionDigits: 2 })}</td>
          </tr>
        </tbody>
      </table>
    </figure>
  );
}
