import Link from "next/link";
import type { ReactNode } from "react";
import { formatDay, loggedByText, versionLabel } from "@/lib/trends/format";
import type { LoggedBy } from "@/lib/trends";

// Table pieces shared by the charts' tables: British dates that open the check-in, the version, who logged it.

export function TrendTable({ caption, head, children }: { caption: string; head: string[]; children: ReactNode }) {
  return (
    <table className="w-full text-left tabular-nums">
      <caption className="mb-2 text-left font-bold">{caption}</caption>
      <thead>
        <tr className="border-b border-line">
          {head.map((label) => (
            <th key={label} scope="col" className="py-2 pr-4 align-bottom">
              {label}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>{children}</tbody>
    </table>
  );
}

export function SessionCells({ clientId, checkInId, day, versionNumber }: { clientId: string; checkInId: string; day: string; versionNumber: number | null }) {
  return (
    <>
      <th scope="row" className="py-2 pr-4 font-normal whitespace-nowrap">
        <Link href={`/clients/${clientId}/check-ins/${checkInId}`}>{formatDay(day)}</Link>
      </th>
      <td className="py-2 pr-4">{versionNumber === null ? "unknown" : versionLabel([versionNumber])}</td>
    </>
  );
}

export function LoggedByCell({ loggedBy }: { loggedBy: LoggedBy }) {
  return <td className="py-2">{loggedByText(loggedBy)}</td>;
}

export const rowClass = "border-b border-line-soft align-top";
export const cellClass = "py-2 pr-4";
