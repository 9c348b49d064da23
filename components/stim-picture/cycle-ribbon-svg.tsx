import { useId } from "react";
import { axisTicks } from "./axis-ticks";
import { cycleSeconds, cycleSegments, ribbonPoints, timeToX, type CycleTimes } from "./cycle-geometry";
import { CycleAxis, CyclePartLabels } from "./cycle-ribbon-parts";
import { FONT_SIZE } from "./svg-text";

export type CycleRibbonSvgProps = {
  times: CycleTimes;
  cycles: number;
  progressSeconds?: number;
  title: string;
  description: string;
  /** View-box width; the drawing keeps its height and text size, so a narrow view box reads better on a phone. */
  width: number;
  className?: string;
};

export const RIBBON_HEIGHT = 190;
export const RIBBON_BAND = { baseY: 116, restThickness: 8, fullHeight: 70 } as const;
export const ribbonPlot = (width: number) => ({ x0: 24, x1: width - 24 });

const toPoints = (points: Array<[number, number]>) => points.map(([x, y]) => `${x.toFixed(2)},${y.toFixed(2)}`).join(" ");

// The ribbon itself: one band that swells from its rest thickness to full height while the set amplitude is held.
export function CycleRibbonSvg({ times, cycles, progressSeconds, title, description, width, className = "" }: CycleRibbonSvgProps) {
  const id = useId();
  const plot = ribbonPlot(width);
  const band = RIBBON_BAND;
  const cycleS = cycleSeconds(times);
  const totalS = cycleS * cycles;
  const filling = progressSeconds !== undefined;
  const progressX = filling ? timeToX(progressSeconds, totalS, plot) : plot.x1;
  const firstCycle = cycleSegments(times, cycles, plot).filter((s) => s.cycle === 0);
  return (
    <svg
      viewBox={`0 0 ${width} ${RIBBON_HEIGHT}`}
      className={`h-auto w-full ${className}`}
      role="img"
      aria-labelledby={`${id}-title`}
      aria-describedby={`${id}-desc`}
    >
      <title id={`${id}-title`}>{title}</title>
      <desc id={`${id}-desc`}>{description}</desc>
      {totalS > 0 ? (
        <>
          {Array.from({ length: cycles }, (_, i) => {
            const x0 = timeToX(i * cycleS, totalS, plot);
            const x1 = timeToX((i + 1) * cycleS, totalS, plot);
            return (
              <g key={i} aria-hidden="true">
                {i > 0 ? <line x1={x0} x2={x0} y1={12} y2={band.baseY} className="stroke-line" strokeWidth={1.5} strokeDasharray="4 4" /> : null}
                <text x={(x0 + x1) / 2} y={22} textAnchor="middle" fontSize={FONT_SIZE} className="fill-ink-soft">
                  Cycle {i + 1}
                </text>
              </g>
            );
          })}
          <polygon
            points={toPoints(ribbonPoints(times, cycles, plot, band))}
            className={filling ? "fill-note-bg stroke-note" : "fill-note stroke-note"}
            strokeWidth={2}
            strokeLinejoin="round"
          />
          {filling ? (
            <>
              <polygon points={toPoints(ribbonPoints(times, cycles, plot, band, progressSeconds))} className="fill-note" />
              <line x1={progressX} x2={progressX} y1={30} y2={band.baseY + 6} className="stroke-ink" strokeWidth={3} strokeLinecap="round" />
            </>
          ) : null}
          <CyclePartLabels segments={firstCycle} y={band.baseY + 18} />
          <CycleAxis ticks={axisTicks(totalS, width < 500 ? 6 : 8)} totalS={totalS} plot={plot} y={band.baseY + 30} />
        </>
      ) : null}
    </svg>
  );
}
