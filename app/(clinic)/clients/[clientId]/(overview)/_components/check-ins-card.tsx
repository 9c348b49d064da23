import Link from "next/link";
import { Card, EmptyState } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { listCheckInsByClientId } from "@/db/queries/check-ins";
import { listFlagsByClientId } from "@/db/queries/flags";

const day = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", timeZone: "UTC" });

// Flags still open, then the latest sessions; each opens the check-in with its photos and the settings in force.
export async function CheckInsCard({ clientId }: { clientId: string }) {
  const [flags, checkIns] = await Promise.all([listFlagsByClientId(clientId), listCheckInsByClientId(clientId, { limit: 10 })]);
  const open = flags.filter((flag) => flag.status !== "resolved");
  return (
    <Card title="Check-ins and flags">
      <div className="flex flex-col gap-3">
        {open.map((flag) => (
          <Notice key={flag.id} tone={flag.severity === "urgent" ? "blocks" : "warning"} word={flag.severity === "urgent" ? "Urgent" : "Review"} title={flag.title}>
            Raised {day.format(flag.createdAt)}.{" "}
            {flag.checkInId ? <Link href={`/clients/${clientId}/check-ins/${flag.checkInId}`}>Open the check-in</Link> : null}
          </Notice>
        ))}
      </div>
      {checkIns.length === 0 ? (
        <EmptyState title="No sessions logged yet">Sessions the client or a carer logs appear here.</EmptyState>
      ) : (
        <table className="mt-4 w-full text-left tabular-nums">
          <caption className="sr-only">Latest sessions</caption>
          <thead>
            <tr className="border-b border-line">
              <th scope="col" className="py-2 pr-3">Day</th>
              <th scope="col" className="py-2 pr-3">Minutes</th>
              <th scope="col" className="py-2 pr-3">Comfort</th>
              <th scope="col" className="py-2 pr-3">Worst skin level</th>
              <th scope="col" className="py-2">Logged by</th>
            </tr>
          </thead>
          <tbody>
            {checkIns.map(({ checkIn, loggedByName }) => (
              <tr key={checkIn.id} className="border-b border-line-soft">
                <td className="py-2 pr-3">
                  <Link href={`/clients/${clientId}/check-ins/${checkIn.id}`}>{day.format(new Date(checkIn.sessionDate))}</Link>
                </td>
                <td className="py-2 pr-3">{checkIn.minutes}</td>
                <td className="py-2 pr-3">{checkIn.comfort}/10</td>
                <td className="py-2 pr-3">{Math.max(...checkIn.skin.map((site) => site.level))}</td>
                <td className="py-2">{checkIn.loggedByRole === "carer" ? `${loggedByName} (carer)` : loggedByName}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      <p className="mt-4 flex flex-wrap gap-4">
        <Link href={`/clients/${clientId}/messages`}>Messages</Link>
        <Link href={`/clients/${clientId}/timeline`}>Timeline</Link>
        <Link href={`/clients/${clientId}/trends`}>Trends over time</Link>
      </p>
    </Card>
  );
}
