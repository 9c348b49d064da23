import { SKIN_SCALE } from "@/lib/check-ins/skin-scale";
import type { SessionRow } from "@/lib/trends";
import { cellClass, LoggedByCell, rowClass, SessionCells, TrendTable } from "./table-parts";

export function ComfortTable({ clientId, rows }: { clientId: string; rows: SessionRow[] }) {
  return (
    <TrendTable caption="Comfort per session, out of 10 (0 very uncomfortable, 10 completely comfortable)" head={["Day", "Version", "Comfort", "Minutes", "Logged by"]}>
      {rows.map((row) => (
        <tr key={row.checkInId} className={rowClass}>
          <SessionCells clientId={clientId} checkInId={row.checkInId} day={row.day} versionNumber={row.versionNumber} />
          <td className={cellClass}>{row.comfort}/10</td>
          <td className={cellClass}>{row.minutes}</td>
          <LoggedByCell loggedBy={row.loggedBy} />
        </tr>
      ))}
    </TrendTable>
  );
}

export function SkinTable({ clientId, rows }: { clientId: string; rows: SessionRow[] }) {
  return (
    <TrendTable caption="Worst skin level per session, and where it was seen" head={["Day", "Version", "Worst level", "Where", "Logged by"]}>
      {rows.map((row) => (
        <tr key={row.checkInId} className={rowClass}>
          <SessionCells clientId={clientId} checkInId={row.checkInId} day={row.day} versionNumber={row.versionNumber} />
          <td className={cellClass}>{row.worstSkinLevel === null ? "not checked" : `${row.worstSkinLevel}: ${SKIN_SCALE[row.worstSkinLevel].words}`}</td>
          <td className={cellClass}>{row.worstSkinLevel === 1 ? "every electrode" : row.worstSkinSites.join("; ")}</td>
          <LoggedByCell loggedBy={row.loggedBy} />
        </tr>
      ))}
    </TrendTable>
  );
}
