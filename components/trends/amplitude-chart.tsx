"use client";

import { CartesianGrid, Line, LineChart, ReferenceLine, Tooltip, YAxis } from "recharts";
import { channelStyle } from "@/components/body-outline/channel-style";
import type { Trends } from "@/lib/trends";
import { formatDay, formatMa, loggedByText, versionLabel } from "@/lib/trends/format";
import { activeRow, TooltipBox, type TooltipArgs } from "./chart-tooltip";
import { ShapeMark } from "./series-shapes";
import { CHART_MARGIN, INK, INK_SOFT, LINE_SOFT, TICK, timeXAxis, versionLines } from "./time-chart-parts";

type Props = Pick<Trends, "axis" | "markers" | "channels" | "amplitude"> & { title: string; summary: string };

// One line per channel (its own dash pattern and marker), each channel's ceiling as thin steps in the same
// pattern, and the version lines. A reading above its ceiling gets a filled, ringed marker.
export function AmplitudeChart({ axis, markers, channels, amplitude, title, summary }: Props) {
  const tooltip = (args: TooltipArgs) => {
    const point = activeRow<{ x: number }>(args);
    const row = point && amplitude.rows.find((r) => r.x === point.x);
    if (!row) return null;
    return (
      <TooltipBox title={formatDay(row.day)}>
        {channels.map((channel, i) => {
          const reading = row.readings[i];
          if (!reading) return null;
          const ceiling = reading.ceilingMa === null ? "" : `, ceiling ${formatMa(reading.ceilingMa)}${reading.aboveCeiling ? ": above it" : ""}`;
          return <p key={channel.id}>{`${channel.shortLabel}: ${formatMa(reading.amplitudeMa)}${ceiling}`}</p>;
        })}
        <p className="text-ink-soft">{`${row.versionNumber === null ? "Version unknown" : versionLabel([row.versionNumber])} · ${loggedByText(row.loggedBy)}`}</p>
      </TooltipBox>
    );
  };
  return (
    <LineChart responsive style={{ width: "100%", height: 320 }} data={amplitude.chartData} margin={CHART_MARGIN} title={title} desc={summary} role="img">
      <CartesianGrid stroke={LINE_SOFT} vertical={false} />
      {timeXAxis(axis)}
      <YAxis domain={[0, "auto"]} tick={TICK} stroke={INK_SOFT} width={56} unit=" mA" allowDecimals={false} />
      {versionLines(markers)}
      {channels.flatMap((channel) =>
        amplitude.ceilings[channel.index]!.map((step) => (
          <ReferenceLine
            key={`${channel.key}-${step.fromX}`}
            segment={[{ x: step.fromX, y: step.ceilingMa }, { x: step.toX, y: step.ceilingMa }]}
            stroke={INK_SOFT}
            strokeWidth={1.5}
            strokeDasharray={channelStyle(channel.index).dash}
            ifOverflow="extendDomain"
          />
        )),
      )}
      {channels.map((channel) => {
        const style = channelStyle(channel.index);
        return (
          <Line
            key={channel.key}
            dataKey={channel.key}
            name={channel.label}
            stroke={INK}
            strokeWidth={2.5}
            strokeDasharray={style.dash}
            isAnimationActive={false}
            dot={(dot) =>
              typeof dot.cx === "number" && typeof dot.cy === "number" && dot.value !== null && dot.value !== undefined ? (
                <g key={dot.key ?? `${channel.key}-${dot.index}`}>
                  <ShapeMark shape={style.shape} cx={dot.cx} cy={dot.cy} filled={dot.payload?.[`${channel.key}Above`] === true} />
                  {dot.payload?.[`${channel.key}Above`] === true ? <circle cx={dot.cx} cy={dot.cy} r={9} fill="none" stroke={INK} strokeWidth={1.5} /> : null}
                </g>
              ) : (
                <g key={`${channel.key}-${dot.index}`} />
              )
            }
            activeDot={false}
          />
        );
      })}
      <Tooltip content={tooltip} cursor={{ stroke: INK_SOFT, strokeWidth: 1 }} isAnimationActive={false} />
    </LineChart>
  );
}
