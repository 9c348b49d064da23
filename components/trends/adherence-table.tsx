import type { AdherenceRow } from "@/lib/trends";
import { formatDay, measureText, versionLabel } from "@/lib/trends/format";
import { cellClass, rowClass, TrendTable } from "./table-parts";

// The real figures, above 100 % included; the chart's bars stop at 100 %.
export function AdherenceTable({ rows }: { rows: AdherenceRow[] }) {
  return (
    <TrendTable caption="Sessions and minutes delivered against prescribed, per week" head={["Week", "Sessions", "Minutes", "Versions in force"]}>
      {rows.map((row) => (
        <tr key={row.weekOf} className={rowClass}>
          <th scope="row" className="py-2 pr-4 font-normal whitespace-nowrap">
            {formatDay(row.from)} to {formatDay(row.to)}
            {row.complete ? null : <span className="block text-ink-soft">this week, so far</span>}
          </th>
          <td className={cellClass}>{measureText(row.deliveredSessions, row.prescribedSessions, row.sessionsPercent)}</td>
          <td className={cellClass}>{measureText(row.deliveredMinutes, row.prescribedMinutes, row.minutesPercent)}</td>
          <td className="py-2">{row.versionNumbers.length === 0 ? "none" : versionLabel(row.versionNumbers)}</td>
        </tr>
      ))}
    </TrendTable>
  );
}
