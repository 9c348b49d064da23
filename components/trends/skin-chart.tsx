"use client";

import { REVIEW_SKIN_LEVEL } from "@/lib/rules/check-in-rules";
import { SKIN_SCALE } from "@/lib/check-ins/skin-scale";
import type { SessionRow } from "@/lib/trends";
import { SessionLineChart, type SessionLineChartProps } from "./session-line-chart";

type Props = Omit<SessionLineChartProps, "dataKey" | "yDomain" | "yTicks" | "threshold" | "describe">;

const describe = (row: SessionRow) =>
  row.worstSkinLevel === null
    ? ["No skin check"]
    : [`Worst level ${row.worstSkinLevel}: ${SKIN_SCALE[row.worstSkinLevel].words}`, `Under ${row.worstSkinSites.join("; ")}`];

// The axis carries the level numbers; the words for each are in the tooltip and in the key under the chart.
export function SkinChart(props: Props) {
  return (
    <SessionLineChart
      {...props}
      dataKey="worstSkinLevel"
      yDomain={[0.5, 5.5]}
      yTicks={[1, 2, 3, 4, 5]}
      threshold={{ y: REVIEW_SKIN_LEVEL, label: "Review level" }}
      describe={describe}
    />
  );
}

