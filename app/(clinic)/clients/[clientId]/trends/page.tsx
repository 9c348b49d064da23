import type { Metadata } from "next";
import Link from "next/link";
import { TrendsView } from "@/components/trends/trends-view";
import { EmptyState } from "@/components/ui/card";
import { listCheckInsByClientId } from "@/db/queries/check-ins";
import { getProgrammeByClientId, listVersionsByProgrammeId } from "@/db/queries/programmes";
import { requirePageClientAccess } from "@/lib/auth/page-guards";
import { buildTrends, dayNumber, dayOfNumber, londonDay, toTrendCheckIn, toTrendVersion } from "@/lib/trends";

export const metadata: Metadata = { title: "Trends" };

// Far more than a programme of several months produces; past it, the oldest sessions are left out and the page
// says so.
const SESSION_LIMIT = 2000;

// The client layout above this page has already checked access with the real status code; the page checks again
// because it needs the record (one cached lookup).
export default async function TrendsPage({ params }: { params: Promise<{ clientId: string }> }) {
  const { clientId } = await params;
  const { client } = await requirePageClientAccess(clientId, "therapist", "admin");
  const programme = await getProgrammeByClientId(client.id);
  const [versionRows, checkInRows] = await Promise.all([
    programme ? listVersionsByProgrammeId(programme.id) : Promise.resolve([]),
    listCheckInsByClientId(client.id, { limit: SESSION_LIMIT }),
  ]);
  const versions = versionRows.map((row) => toTrendVersion(row.version));
  const checkIns = checkInRows.map(toTrendCheckIn);
  // Rows come newest first; when the limit cut them off, the earliest day loaded may be incomplete.
  const truncated = checkInRows.length === SESSION_LIMIT;
  const completeFrom = truncated ? dayOfNumber(dayNumber(checkIns.at(-1)!.sessionDate) + 1) : undefined;
  const trends = buildTrends({ versions, checkIns, today: londonDay(new Date()), completeFrom });

  return (
    <div className="flex flex-col gap-6">
      <p>
        <Link href={`/clients/${client.id}`}>← {client.fullName}</Link>
      </p>
      <div>
        <h1 className="text-3xl">Trends over time</h1>
        <p className="mt-1 text-ink-soft">
          {client.fullName}: amplitude, comfort, skin and adherence, session by session. Days are the clinic&apos;s (UK time); each day opens its check-in.
        </p>
      </div>
      {trends ? (
        <>
          <section aria-labelledby="versions-title">
            <h2 id="versions-title" className="text-xl">
              Versions marked on the charts
            </h2>
            <ul className="mt-2 flex flex-col gap-1 tabular-nums">
              {trends.markers.map((marker) => (
                <li key={marker.day}>
                  <span className="font-bold">{marker.label}</span>: {marker.description}
                </li>
              ))}
            </ul>
            <p className="mt-2">
              <Link href={`/clients/${client.id}/programme/versions`}>What changed in each version</Link>
            </p>
          </section>
          {truncated ? <p className="font-bold">Only the latest {SESSION_LIMIT.toLocaleString("en-GB")} sessions are shown.</p> : null}
          <TrendsView clientId={client.id} trends={trends} />
        </>
      ) : versions.length === 0 ? (
        <EmptyState title="No programme published yet">
          Trends start once a programme is published and {client.fullName} or a carer logs a session.{" "}
          <Link href={`/clients/${client.id}/programme`}>Open the programme builder</Link>
        </EmptyState>
      ) : (
        <EmptyState title="No sessions logged yet">
          The charts appear here once {client.fullName} or a carer logs a session against the programme.
        </EmptyState>
      )}
    </div>
  );
}
