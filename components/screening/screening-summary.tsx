import Link from "next/link";
import { buttonClasses } from "@/components/ui/button";
import { Card, EmptyState } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { getCurrentActor } from "@/lib/auth/current";
import { getPublishingGate, type PublishingGate } from "@/lib/screening/gate";
import { formatCalendarDate, formatMoment, isBeforeToday } from "./format";
import { GateNotice } from "./gate-notice";

// The screening card on the client page: the latest outcome, its red flags and their clearances, the re-screen date,
// and whether the screening holds up publishing. The page has already checked access; pass `gate` if you have it.
export async function ScreeningSummary({ clientId, gate }: { clientId: string; gate?: PublishingGate }) {
  const [result, actor] = await Promise.all([gate ?? getPublishingGate(clientId), getCurrentActor()]);
  const latest = result.latest;
  const base = `/clients/${encodeURIComponent(clientId)}/screening`;
  const canSign = actor?.role === "therapist";
  return (
    <Card title="Screening">
      <div className="flex flex-col gap-4">
        <GateNotice gate={result} />
        {latest ? (
          <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
            <dt className="font-bold">Outcome</dt>
            <dd>{latest.outcomeLabel}</dd>
            <dt className="font-bold">Signed</dt>
            <dd>
              Version {latest.version}, by {latest.signedByName}, {formatMoment(latest.signedAt)}
            </dd>
            <dt className="font-bold">Red flags</dt>
            <dd>
              {latest.redFlags.length === 0 ? (
                "None recorded"
              ) : (
                <ul>
                  {latest.redFlags.map((flag) => (
                    <li key={flag.id}>
                      {flag.label}: {flag.clearance ? `cleared by ${flag.clearance.clinicianName}` : "no clearance yet"}
                    </li>
                  ))}
                </ul>
              )}
            </dd>
            <dt className="font-bold">Screen again by</dt>
            <dd className="tabular-nums">{latest.rescreenOn ? formatCalendarDate(latest.rescreenOn) : "No date set"}</dd>
          </dl>
        ) : (
          <EmptyState title="Not screened yet">Sign a contraindication screening before the first programme is published.</EmptyState>
        )}
        {latest?.rescreenOn && isBeforeToday(latest.rescreenOn) ? (
          <Notice tone="warning" title="Re-screen due">
            The re-screen date of {formatCalendarDate(latest.rescreenOn)} has passed.
          </Notice>
        ) : null}
        <div className="flex flex-wrap gap-3">
          {latest ? (
            <Link href={base} className={buttonClasses("secondary")}>
              Screening history
            </Link>
          ) : null}
          {canSign ? (
            <Link href={`${base}/new`} className={buttonClasses(latest ? "secondary" : "primary")}>
              {latest ? "Screen again" : "Start screening"}
            </Link>
          ) : null}
        </div>
      </div>
    </Card>
  );
}
