import Link from "next/link";
import type { ScreeningSummary } from "@/lib/screening/summary";
import { formatMoment } from "./format";

function flagsText(summary: ScreeningSummary): string {
  const total = summary.redFlags.length;
  if (total === 0) return "None";
  const open = summary.redFlags.filter((flag) => !flag.clearance).length;
  return open === 0 ? `${total}, all cleared` : `${total}, ${open} without clearance`;
}

// Every signed version, newest first, each linking to its read-only view.
export function VersionTable({ clientId, versions }: { clientId: string; versions: ScreeningSummary[] }) {
  return (
    <table className="w-full text-left">
      <caption className="sr-only">Signed screenings, newest first</caption>
      <thead>
        <tr className="border-b border-line">
          <th scope="col" className="py-2 pr-3">Version</th>
          <th scope="col" className="py-2 pr-3">Signed by</th>
          <th scope="col" className="py-2 pr-3">Signed on</th>
          <th scope="col" className="py-2 pr-3">Outcome</th>
          <th scope="col" className="py-2">Red flags</th>
        </tr>
      </thead>
      <tbody>
        {versions.map((version) => (
          <tr key={version.id} className="border-b border-line-soft">
            <th scope="row" className="py-2 pr-3">
              <Link href={`/clients/${encodeURIComponent(clientId)}/screening/versions/${version.version}`} className="inline-flex min-h-11 items-center font-bold">
                Version {version.version}
              </Link>
            </th>
            <td className="py-2 pr-3">{version.signedByName}</td>
            <td className="py-2 pr-3 tabular-nums">{formatMoment(version.signedAt)}</td>
            <td className="py-2 pr-3">{version.outcomeLabel}</td>
            <td className="py-2">{flagsText(version)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
