"use client";

import { CartesianGrid, Line, LineChart, ReferenceLine, Tooltip, YAxis } from "recharts";
import type { SessionRow, Trends } from "@/lib/trends";
import { formatDay, loggedByText, versionLabel } from "@/lib/trends/format";
import { activeRow, TooltipBox, type TooltipArgs } from "./chart-tooltip";
import { ShapeMark } from "./series-shapes";
import { CHART_MARGIN, INK, INK_SOFT, LINE_SOFT, TICK, timeXAxis, versionLines } from "./time-chart-parts";

export type SessionLineChartProps = Pick<Trends, "axis" | "markers"> & {
  rows: SessionRow[];
  dataKey: "comfort" | "worstSkinLevel";
  yDomain: [number, number];
  yTicks: number[];
  yWidth?: number;
  /** A level the rules watch, drawn as a labelled horizontal line. */
  threshold: { y: number; label: string };
  describe: (row: SessionRow) => string[];
  title: string;
  summary: string;
};

// One figure per session over time (comfort, or the worst skin level), with the version lines: the shape shared by
// the comfort and skin charts.
export function SessionLineChart({ axis, markers, rows, dataKey, yDomain, yTicks, yWidth = 40, threshold, describe, title, summary }: SessionLineChartProps) {
  const tooltip = (args: TooltipArgs) => {
    const row = activeRow<SessionRow>(args);
    if (!row) return null;
    return (
      <TooltipBox title={formatDay(row.day)}>
        {describe(row).map((line) => (
          <p key={line}>{line}</p>
        ))}
        <p className="text-ink-soft">{`${row.versionNumber === null ? "Version unknown" : versionLabel([row.versionNumber])} · ${loggedByText(row.loggedBy)}`}</p>
      </TooltipBox>
    );
  };
  return (
    <LineChart responsive style={{ width: "100%", height: 280 }} data={rows} margin={CHART_MARGIN} title={title} desc={summary} role="img">
      <CartesianGrid stroke={LINE_SOFT} vertical={false} />
      {timeXAxis(axis)}
      <YAxis domain={yDomain} ticks={yTicks} tick={TICK} stroke={INK_SOFT} width={yWidth} allowDecimals={false} interval={0} />
      {versionLines(markers)}
      <ReferenceLine
        y={threshold.y}
        stroke={INK_SOFT}
        strokeWidth={1.5}
        strokeDasharray="8 4"
        label={{ value: threshold.label, position: "insideBottomRight", fill: INK, fontSize: 12 }}
      />
      <Line
        dataKey={dataKey}
        stroke={INK}
        strokeWidth={2.5}
        isAnimationActive={false}
        dot={(dot) =>
          typeof dot.cx === "number" && typeof dot.cy === "number" ? (
            <ShapeMark key={dot.key ?? dot.index} shape="circle" cx={dot.cx} cy={dot.cy} />
          ) : (
            <g key={dot.index} />
          )
        }
        activeDot={false}
      />
      <Tooltip content={tooltip} cursor={{ stroke: INK_SOFT, strokeWidth: 1 }} isAnimationActive={false} />
    </LineChart>
  );
}
