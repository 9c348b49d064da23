import type { ScreeningSummary } from "@/lib/screening/summary";
import { formatCalendarDate, formatMoment } from "./format";

// Who signed a version and when: the reviewer and date of the screening.
export function VersionFacts({ summary }: { summary: ScreeningSummary }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
      <dt className="font-bold">Outcome</dt>
      <dd>{summary.outcomeLabel}</dd>
      <dt className="font-bold">Signed by</dt>
      <dd>{summary.signedByName}</dd>
      <dt className="font-bold">Signed on</dt>
      <dd className="tabular-nums">{formatMoment(summary.signedAt)}</dd>
      <dt className="font-bold">Screen again by</dt>
      <dd className="tabular-nums">{summary.rescreenOn ? formatCalendarDate(summary.rescreenOn) : "No date set"}</dd>
    </dl>
  );
}
