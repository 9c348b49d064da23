import type { Metadata } from "next";
import Link from "next/link";
import { buttonClasses } from "@/components/ui/button";
import { Card, EmptyState } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { listResolvedFlagsByOrganizationId, listReviewQueue } from "@/db/queries/flags";
import { requirePageActor } from "@/lib/auth/page-guards";
import { FlagActions } from "./_components/flag-actions";

export const metadata: Metadata = { title: "Review queue" };

const when = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "Europe/London" });

// Open flags across the caseload (or the whole clinic), urgent first and then the oldest, each with what it is
// about; acknowledging and resolving keep the flag in the record.
export default async function ReviewPage({ searchParams }: { searchParams: Promise<{ scope?: string }> }) {
  const actor = await requirePageActor("therapist", "admin");
  const wholeClinic = actor.role === "admin" || (await searchParams).scope === "clinic";
  const therapistId = wholeClinic ? null : actor.userId;
  const [open, resolved] = await Promise.all([listReviewQueue(actor.organizationId, therapistId), listResolvedFlagsByOrganizationId(actor.organizationId, therapistId)]);
  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-3xl">Review queue</h1>
          <p className="mt-1 text-ink-soft">{wholeClinic ? "Every client of the clinic." : "Clients for whom you are the primary therapist."} Urgent first, then the oldest.</p>
        </div>
        {actor.role === "therapist" ? (
          <Link href={wholeClinic ? "/review" : "/review?scope=clinic"} className={buttonClasses("secondary")}>
            {wholeClinic ? "Show only my caseload" : "Show the whole clinic"}
          </Link>
        ) : null}
      </div>
      {open.length === 0 ? (
        <EmptyState title="Nothing to review">Flags raised by clients&apos; reports and by the daily checks appear here.</EmptyState>
      ) : (
        <ol className="flex flex-col gap-4" aria-label="Open flags">
          {open.map(({ flag, clientName }) => (
            <li key={flag.id}>
              <Notice tone={flag.severity === "urgent" ? "blocks" : "warning"} word={flag.severity === "urgent" ? "Urgent" : "Review"} title={`${clientName}: ${flag.title}`}>
                <p className="text-sm">
                  Raised {when.format(flag.createdAt)} · {flag.status === "acknowledged" ? "acknowledged" : "not yet acknowledged"}
                </p>
                <p className="mt-1 flex flex-wrap gap-4">
                  {flag.checkInId ? <Link href={`/clients/${flag.clientId}/check-ins/${flag.checkInId}`}>Open the session log and photos</Link> : null}
                  <Link href={`/clients/${flag.clientId}/messages`}>Messages</Link>
                  {actor.role === "therapist" ? <Link href={`/clients/${flag.clientId}/programme?prompt=${flag.checkInId ? `check-in:${flag.checkInId}` : `flag:${flag.id}`}`}>Propose a change</Link> : null}
                </p>
                {actor.role === "therapist" ? (
                  <div className="mt-3">
                    <FlagActions flagId={flag.id} status={flag.status === "acknowledged" ? "acknowledged" : "open"} label={`${clientName}: ${flag.title}`} />
                  </div>
                ) : null}
              </Notice>
            </li>
          ))}
        </ol>
      )}
      <Card title="Recently resolved">
        {resolved.length === 0 ? (
          <p className="text-ink-soft">None yet.</p>
        ) : (
          <ul className="flex flex-col gap-2">
            {resolved.map(({ flag, clientName }) => (
              <li key={flag.id} className="border-b border-line-soft pb-2">
                <span className="font-bold">{clientName}</span>: {flag.title}
                <span className="block text-sm text-ink-soft">
                  Resolved {flag.resolvedAt ? when.format(flag.resolvedAt) : ""}: {flag.resolutionNote}
                </span>
              </li>
            ))}
          </ul>
        )}
      </Card>
    </div>
  );
}
