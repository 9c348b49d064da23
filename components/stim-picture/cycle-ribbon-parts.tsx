import { timeToX, type CycleSegment, type PlotX } from "./cycle-geometry";
import { PART_NAMES } from "./cycle-text";
import { formatFigure } from "./format";
import { FONT_SIZE, textWidth } from "./svg-text";

export function partLabel(segment: CycleSegment): string | null {
  const width = segment.x1 - segment.x0;
  const secs = `${formatFigure(segment.endS - segment.startS, { maxFractionDigits: 2 })} s`;
  const long = `${PART_NAMES[segment.part].toLowerCase()} ${secs}`;
  if (textWidth(long) + 6 <= width) return long;
  if (textWidth(secs) + 4 <= width) return secs;
  return null;
}

export function CyclePartLabels({ segments, y }: { segments: CycleSegment[]; y: number }) {
  return (
    <g aria-hidden="true">
      {segments.map((s) => {
        const label = partLabel(s);
        return label ? (
          <text key={`${s.cycle}-${s.part}`} x={(s.x0 + s.x1) / 2} y={y} textAnchor="middle" fontSize={FONT_SIZE} className="fill-ink tabular-nums">
            {label}
          </text>
        ) : null;
      })}
    </g>
  );
}

export function CycleAxis({ ticks, totalS, plot, y }: { ticks: number[]; totalS: number; plot: PlotX; y: number }) {
  return (
    <g aria-hidden="true" className="tabular-nums">
      <line x1={plot.x0} x2={plot.x1} y1={y} y2={y} className="stroke-ink" strokeWidth={1.5} />
      {ticks.map((t) => {
        const x = timeToX(t, totalS, plot);
        return (
          <g key={t}>
            <line x1={x} x2={x} y1={y} y2={y + 6} className="stroke-ink" strokeWidth={1.5} />
            <text x={x} y={y + 20} textAnchor="middle" fontSize={FONT_SIZE} className="fill-ink">
              {formatFigure(t, { maxFractionDigits: 2 })}
            </text>
          </g>
        );
      })}
      <text x={plot.x1} y={y + 38} textAnchor="end" fontSize={FONT_SIZE} className="fill-ink-soft">
        time (s)
      </text>
    </g>
  );
}
