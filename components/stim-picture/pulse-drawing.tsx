import { currentToY, type PulseGeometry, type PulseInput } from "./pulse-geometry";
import { amplitudeLabel, durationLabels, hz, us } from "./pulse-text";
import { FONT_SIZE, textWidth } from "./svg-text";

const BASE_Y = 125;
const HEIGHT = 70;
const DIM_Y = 205;
const ROWS = [222, 240];

function BreakMark({ x, y }: { x: number; y: number }) {
  return (
    <g className="stroke-ink" strokeWidth={2}>
      <line x1={x - 8} x2={x - 2} y1={y + 7} y2={y - 7} />
      <line x1={x + 2} x2={x + 8} y1={y + 7} y2={y - 7} />
    </g>
  );
}

// The SVG body of PulseShape. Labels sit on two rows under the parts so that a narrow part (an interphase gap)
// drops its label to the second row instead of printing over its neighbour.
export function PulseDrawing({ input, geometry }: { input: PulseInput; geometry: PulseGeometry }) {
  const maxAbs = Math.max(0, ...input.phases.map((p) => Math.abs(p.currentMa)));
  const y = (currentMa: number) => currentToY(currentMa, maxAbs, BASE_Y, HEIGHT);
  const x0 = geometry.parts[0]?.x0 ?? 0;
  const x1 = geometry.parts.at(-1)?.x1 ?? x0;
  const levels = [...new Set([0, ...input.phases.map((p) => p.currentMa)])];
  const { breakX } = geometry;
  // The overlap marker's words go on whichever side of it has more room.
  const leftOfMarker = geometry.periodX - x0 > x1 - geometry.periodX;
  return (
    <g className="tabular-nums">
      <g aria-hidden="true">
        <line x1={x0} x2={geometry.periodX} y1={30} y2={30} className="stroke-ink" strokeWidth={1.5} />
        <line x1={x0} x2={x0} y1={24} y2={36} className="stroke-ink" strokeWidth={1.5} />
        <line x1={geometry.periodX} x2={geometry.periodX} y1={24} y2={36} className="stroke-ink" strokeWidth={1.5} />
        {breakX !== null ? <BreakMark x={breakX} y={30} /> : null}
        <text x={(x0 + geometry.periodX) / 2} y={18} textAnchor="middle" fontSize={FONT_SIZE} className="fill-ink">
          period {us(input.periodUs)} ({hz(input.periodUs)})
        </text>
        <line x1={x0} x2={x0} y1={BASE_Y - HEIGHT - 6} y2={BASE_Y + HEIGHT + 6} className="stroke-ink-soft" strokeWidth={1} />
        {levels.map((level, i) => {
          const ly = y(level);
          // A level close to the baseline moves its label clear of the "0 mA" label.
          const labelY = level !== 0 && Math.abs(ly - BASE_Y) < 14 ? BASE_Y + Math.sign(ly - BASE_Y || 1) * 14 : ly;
          return (
            <text key={i} x={x0 - 8} y={labelY + 4} textAnchor="end" fontSize={FONT_SIZE} className="fill-ink">
              {amplitudeLabel(level)}
            </text>
          );
        })}
      </g>
      {geometry.parts.map((part) =>
        part.kind === "phase" ? (
          <rect
            key={`phase-${part.phase}`}
            x={part.x0}
            width={Math.max(part.x1 - part.x0, 1)}
            y={Math.min(y(part.currentMa), BASE_Y)}
            height={Math.abs(y(part.currentMa) - BASE_Y)}
            className="fill-ink"
          />
        ) : null,
      )}
      <g aria-hidden="true">
        {breakX !== null ? (
          <>
            <line x1={x0} x2={breakX - 5} y1={BASE_Y} y2={BASE_Y} className="stroke-ink" strokeWidth={2} />
            <line x1={breakX + 5} x2={x1} y1={BASE_Y} y2={BASE_Y} className="stroke-ink" strokeWidth={2} />
            <BreakMark x={breakX} y={BASE_Y} />
          </>
        ) : (
          <line x1={x0} x2={x1} y1={BASE_Y} y2={BASE_Y} className="stroke-ink" strokeWidth={2} />
        )}
        {geometry.overlap ? (
          <g>
            <line x1={geometry.periodX} x2={geometry.periodX} y1={36} y2={DIM_Y} className="stroke-blocks" strokeWidth={2} strokeDasharray="5 4" />
            <text x={geometry.periodX + (leftOfMarker ? -6 : 6)} y={48} textAnchor={leftOfMarker ? "end" : "start"} fontSize={FONT_SIZE} className="fill-blocks font-bold">
              next pulse starts here
            </text>
          </g>
        ) : null}
        {geometry.parts.map((part) => {
          const width = part.x1 - part.x0;
          const { long, short } = durationLabels(part);
          const fitsLong = textWidth(long) + 6 <= width;
          const label = fitsLong ? long : short;
          const row = fitsLong || textWidth(short) + 4 <= width ? ROWS[0] : ROWS[1];
          return (
            <g key={`dim-${part.kind}-${part.phase ?? ""}`}>
              <line x1={part.x0 + 1} x2={part.x1 - 1} y1={DIM_Y} y2={DIM_Y} className="stroke-ink-soft" strokeWidth={1} />
              <line x1={part.x0 + 1} x2={part.x0 + 1} y1={DIM_Y - 4} y2={DIM_Y + 4} className="stroke-ink-soft" strokeWidth={1} />
              <text x={(part.x0 + part.x1) / 2} y={row} textAnchor="middle" fontSize={FONT_SIZE} className="fill-ink">
                {label}
              </text>
            </g>
          );
        })}
      </g>
    </g>
  );
}
