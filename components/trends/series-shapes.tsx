import type { MarkerShape } from "@/components/body-outline/channel-style";

// Marker shapes for the chart lines: the same shape per channel as on the body outline, so a reader who knows
// channel 2 as the square meets the square again here.
function points(shape: Exclude<MarkerShape, "circle">, cx: number, cy: number, r: number): string {
  const corners =
    shape === "square"
      ? [[-r, -r], [r, -r], [r, r], [-r, r]]
      : shape === "diamond"
        ? [[0, -r * 1.25], [r * 1.25, 0], [0, r * 1.25], [-r * 1.25, 0]]
        : [0, 60, 120, 180, 240, 300].map((deg) => [r * 1.1 * Math.cos((deg * Math.PI) / 180), r * 1.1 * Math.sin((deg * Math.PI) / 180)]);
  return corners.map(([x, y]) => `${cx + x!},${cy + y!}`).join(" ");
}

export function ShapeMark({ shape, cx, cy, r = 4.5, filled = false }: { shape: MarkerShape; cx: number; cy: number; r?: number; filled?: boolean }) {
  // Hollow markers stay hollow (no fill), so when two channels read the same the one underneath still shows.
  const paint = { className: `stroke-ink ${filled ? "fill-ink" : "fill-none"}`, strokeWidth: 2 };
  return shape === "circle" ? <circle cx={cx} cy={cy} r={r} {...paint} /> : <polygon points={points(shape, cx, cy, r)} {...paint} />;
}
