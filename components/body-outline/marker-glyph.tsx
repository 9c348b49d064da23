import type { MarkerShape } from "./channel-style";
import { MARKER_RADIUS } from "./marker-geometry";

const r = MARKER_RADIUS;

function shapePoints(shape: Exclude<MarkerShape, "circle">, x: number, y: number): string {
  const corners =
    shape === "square"
      ? [[-0.9, -0.9], [0.9, -0.9], [0.9, 0.9], [-0.9, 0.9]]
      : shape === "diamond"
        ? [[0, -1.25], [1.25, 0], [0, 1.25], [-1.25, 0]]
        : [0, 1, 2, 3, 4, 5].map((k) => [Math.cos((Math.PI / 3) * k) * 1.1, Math.sin((Math.PI / 3) * k) * 1.1]);
  return corners.map(([dx, dy]) => `${(x + dx! * r).toFixed(1)},${(y + dy! * r).toFixed(1)}`).join(" ");
}

/**
 * One marker as drawn: the channel's shape with its tag ("1A") written on it, so a marker never depends on
 * colour. `muted` for channels other than the one being edited.
 */
export function MarkerGlyph({ x, y, shape, tag, muted = false }: { x: number; y: number; shape: MarkerShape; tag: string; muted?: boolean }) {
  const body = muted ? "fill-card stroke-ink-soft" : "fill-ink stroke-card";
  return (
    <g aria-hidden="true">
      {shape === "circle" ? (
        <circle cx={x} cy={y} r={r} className={body} strokeWidth={2} />
      ) : (
        <polygon points={shapePoints(shape, x, y)} className={body} strokeWidth={2} strokeLinejoin="round" />
      )}
      <text
        x={x}
        y={y}
        textAnchor="middle"
        dominantBaseline="central"
        fontSize={11}
        fontWeight={700}
        className={muted ? "fill-ink-soft" : "fill-card"}
      >
        {tag}
      </text>
    </g>
  );
}
