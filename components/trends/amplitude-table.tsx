import type { AmplitudeRow, ChannelSeries } from "@/lib/trends";
import { formatMa } from "@/lib/trends/format";
import { cellClass, LoggedByCell, rowClass, SessionCells, TrendTable } from "./table-parts";

export function AmplitudeTable({ clientId, rows, channels }: { clientId: string; rows: AmplitudeRow[]; channels: ChannelSeries[] }) {
  return (
    <TrendTable caption="Amplitude reached per session, against the ceiling of the session's version" head={["Day", "Version", ...channels.map((c) => c.label), "Logged by"]}>
      {rows.map((row) => (
        <tr key={row.checkInId} className={rowClass}>
          <SessionCells clientId={clientId} checkInId={row.checkInId} day={row.day} versionNumber={row.versionNumber} />
          {row.readings.map((reading, i) => (
            <td key={channels[i]!.id} className={cellClass}>
              {reading ? (
                <>
                  {formatMa(reading.amplitudeMa)}
                  {reading.ceilingMa === null ? null : <span className="text-ink-soft"> (ceiling {formatMa(reading.ceilingMa)})</span>}
                  {reading.aboveCeiling ? <strong className="block">above the ceiling</strong> : null}
                </>
              ) : (
                <span className="text-ink-soft">not in this version</span>
              )}
            </td>
          ))}
          <LoggedByCell loggedBy={row.loggedBy} />
        </tr>
      ))}
    </TrendTable>
  );
}
