"use client";

import { LOW_COMFORT } from "@/lib/rules/check-in-rules";
import type { SessionRow } from "@/lib/trends";
import { SessionLineChart, type SessionLineChartProps } from "./session-line-chart";

type Props = Omit<SessionLineChartProps, "dataKey" | "yDomain" | "yTicks" | "threshold" | "describe">;

const describe = (row: SessionRow) => [`Comfort ${row.comfort} out of 10`, `${row.minutes} minutes`];

// 0 is very uncomfortable and 10 completely comfortable, as the client's form puts it.
export function ComfortChart(props: Props) {
  return (
    <SessionLineChart
      {...props}
      dataKey="comfort"
      yDomain={[0, 10]}
      yTicks={[0, 2, 4, 6, 8, 10]}
      threshold={{ y: LOW_COMFORT, label: "Low comfort" }}
      describe={describe}
    />
  );
}
