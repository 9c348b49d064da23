import type { Metadata } from "next";
import Link from "next/link";
import { EmptyState } from "@/components/ui/card";
import { listCheckInsByClientId } from "@/db/queries/check-ins";
import { listConfirmationsByClientId } from "@/db/queries/confirmations";
import { listFlagsByClientId } from "@/db/queries/flags";
import { listMessagesByClientId } from "@/db/queries/messages";
import { getProgrammeByClientId, listVersionsByProgrammeId } from "@/db/queries/programmes";
import { requirePageClientAccess } from "@/lib/auth/page-guards";
import { buildTimeline, type TimelineKind } from "@/lib/timeline/build-timeline";

export const metadata: Metadata = { title: "Timeline" };

const when = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "Europe/London" });
// Each kind has a symbol and a word, never a colour alone.
const KIND: Record<TimelineKind, { icon: string; word: string; classes: string }> = {
  version: { icon: "◆", word: "Programme change", classes: "border-ink" },
  "check-in": { icon: "●", word: "Session log", classes: "border-line" },
  flag: { icon: "▲", word: "Flag", classes: "border-warning" },
  "flag-resolved": { icon: "✓", word: "Flag resolved", classes: "border-ok" },
  message: { icon: "✉", word: "Message", classes: "border-note" },
  confirmation: { icon: "✓", word: "Stimulator set", classes: "border-ok" },
};

export default async function TimelinePage({ params }: { params: Promise<{ clientId: string }> }) {
  const { clientId } = await params;
  const { client } = await requirePageClientAccess(clientId, "therapist", "admin");
  const programme = await getProgrammeByClientId(client.id);
  const [versions, checkIns, flags, messages, confirmations] = await Promise.all([
    programme ? listVersionsByProgrammeId(programme.id) : Promise.resolve([]),
    listCheckInsByClientId(client.id),
    listFlagsByClientId(client.id),
    listMessagesByClientId(client.id),
    listConfirmationsByClientId(client.id),
  ]);
  const entries = buildTimeline(client.id, {
    versions: versions.map(({ version, authorName }) => ({ ...version, authorName })),
    checkIns: checkIns.map(({ checkIn, loggedByName }) => ({
      id: checkIn.id,
      createdAt: checkIn.createdAt,
      sessionDate: checkIn.sessionDate,
      minutes: checkIn.minutes,
      comfort: checkIn.comfort,
      worstSkin: Math.max(...checkIn.skin.map((s) => s.level)),
      loggedBy: checkIn.loggedByRole === "carer" ? `${loggedByName} (carer)` : loggedByName,
    })),
    flags,
    messages: messages.map(({ message, authorName }) => ({ ...message, authorName })),
    confirmations,
  });
  return (
    <div className="flex flex-col gap-6">
      <p>
        <Link href={`/clients/${client.id}`}>← {client.fullName}</Link>
      </p>
      <h1 className="text-3xl">Timeline for {client.fullName}</h1>
      <p className="text-ink-soft">What changed, when, and what followed: newest first.</p>
      {entries.length === 0 ? (
        <EmptyState title="Nothing yet">Programme versions, session logs, flags and messages appear here as they happen.</EmptyState>
      ) : (
        <ol className="flex flex-col gap-2 border-l-4 border-line pl-4" aria-label="Timeline, newest first">
          {entries.map((entry, index) => (
            <li key={`${entry.kind}-${index}`} className={`rounded-md border-l-4 bg-card px-3 py-2 ${KIND[entry.kind].classes}`}>
              <p className="text-sm text-ink-soft tabular-nums">
                <span aria-hidden>{KIND[entry.kind].icon} </span>
                {KIND[entry.kind].word} · {when.format(entry.at)}
              </p>
              <p className="font-bold">{entry.href ? <Link href={entry.href}>{entry.title}</Link> : entry.title}</p>
              {entry.detail ? <p>{entry.detail}</p> : null}
            </li>
          ))}
        </ol>
      )}
    </div>
  );
}
