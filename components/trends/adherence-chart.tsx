"use client";

import { useId } from "react";
import { Bar, BarChart, CartesianGrid, LabelList, Tooltip, XAxis, YAxis } from "recharts";
import type { AdherenceRow } from "@/lib/trends";
import { formatDay, measureText, versionLabel } from "@/lib/trends/format";
import { activeRow, TooltipBox, type TooltipArgs } from "./chart-tooltip";
import { INK, INK_SOFT, LINE_SOFT, TICK } from "./time-chart-parts";

// A bar cut off at 100 % gets a chevron above it, and its real share over that where the bar is wide enough to
// hold the figure (on a phone the bars are narrower than "140%").
function overMark(props: { viewBox?: unknown; value?: unknown }) {
  const box = props.viewBox as { x?: number; y?: number; width?: number } | undefined;
  if (!props.value || typeof box?.x !== "number" || typeof box.y !== "number" || typeof box.width !== "number") return <g />;
  const cx = box.x + box.width / 2;
  return (
    <g>
      <path d={`M ${cx - 5} ${box.y - 3} L ${cx} ${box.y - 8} L ${cx + 5} ${box.y - 3}`} fill="none" stroke={INK} strokeWidth={2} />
      {box.width >= 30 ? (
        <text x={cx} y={box.y - 12} textAnchor="middle" fill={INK} fontSize={12}>
          {String(props.value)}
        </text>
      ) : null}
    </g>
  );
}

// Two bars a week, sessions (solid) and minutes (hatched), as a share of what was prescribed. Bars stop at 100 %;
// the tooltip and the table always give the real figures.
export function AdherenceChart({ rows, title, summary }: { rows: AdherenceRow[]; title: string; summary: string }) {
  const hatch = `hatch-${useId().replace(/:/g, "")}`;
  const over = (key: "sessionsPercent" | "minutesPercent") => (_entry: unknown, index: number) => {
    const value = rows[index]?.[key] ?? null;
    return value !== null && value > 100 ? `${value}%` : "";
  };
  const tooltip = (args: TooltipArgs) => {
    const row = activeRow<AdherenceRow>(args);
    if (!row) return null;
    return (
      <TooltipBox title={`${formatDay(row.from)} to ${formatDay(row.to)}`}>
        <p>{`Sessions: ${measureText(row.deliveredSessions, row.prescribedSessions, row.sessionsPercent)}`}</p>
        <p>{`Minutes: ${measureText(row.deliveredMinutes, row.prescribedMinutes, row.minutesPercent)}`}</p>
        <p className="text-ink-soft">{`In force: ${versionLabel(row.versionNumbers)}`}</p>
      </TooltipBox>
    );
  };
  return (
    <BarChart responsive style={{ width: "100%", height: 300 }} data={rows} margin={{ top: 32, right: 16, bottom: 8, left: 4 }} title={title} desc={summary} role="img" barGap={2}>
      <defs>
        <pattern id={hatch} width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <rect width="6" height="6" fill="var(--color-card)" />
          <line x1="0" y1="0" x2="0" y2="6" stroke={INK} strokeWidth="2.5" />
        </pattern>
      </defs>
      <CartesianGrid stroke={LINE_SOFT} vertical={false} />
      <XAxis dataKey="label" tick={TICK} stroke={INK_SOFT} interval="preserveStartEnd" />
      <YAxis domain={[0, 100]} ticks={[0, 25, 50, 75, 100]} tick={TICK} stroke={INK_SOFT} unit="%" width={52} />
      <Bar dataKey="sessionsBar" name="Sessions" fill={INK} stroke={INK} isAnimationActive={false}>
        <LabelList valueAccessor={over("sessionsPercent")} content={overMark} />
      </Bar>
      <Bar dataKey="minutesBar" name="Minutes" fill={`url(#${hatch})`} stroke={INK} strokeWidth={1.5} isAnimationActive={false}>
        <LabelList valueAccessor={over("minutesPercent")} content={overMark} />
      </Bar>
      <Tooltip content={tooltip} cursor={{ fill: "var(--color-line-soft)" }} isAnimationActive={false} />
    </BarChart>
  );
}
