import { ReferenceLine, XAxis } from "recharts";
import type { VersionMarker } from "@/lib/trends";
import { formatTick } from "@/lib/trends/format";
import { VERSION_LINE_DASH } from "./series-key";

// Pieces every time chart shares. They are plain functions returning recharts elements rather than components,
// so each chart lists them among its own children.

export const INK = "var(--color-ink)";
export const INK_SOFT = "var(--color-ink-soft)";
export const LINE_SOFT = "var(--color-line)";
export const TICK = { fill: INK, fontSize: 13 };
export const CHART_MARGIN = { top: 40, right: 24, bottom: 8, left: 4 };

export function timeXAxis(axis: { domain: [number, number]; ticks: number[] }) {
  return <XAxis type="number" dataKey="x" domain={axis.domain} ticks={axis.ticks} tickFormatter={formatTick} allowDataOverflow tick={TICK} stroke={INK_SOFT} />;
}

// Labels of markers a few days apart would collide, so every other one sits higher.
export function versionLines(markers: VersionMarker[]) {
  return markers.map((marker, i) => (
    <ReferenceLine
      key={marker.day}
      x={marker.x}
      stroke={INK_SOFT}
      strokeWidth={1.5}
      strokeDasharray={VERSION_LINE_DASH}
      ifOverflow="extendDomain"
      label={{ value: marker.label, position: "top", offset: i % 2 === 0 ? 6 : 18, fill: INK, fontSize: 13, fontWeight: 700 }}
    />
  ));
}
