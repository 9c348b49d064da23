import type { Metadata } from "next";
import Link from "next/link";
import { CarerList } from "@/components/carer-list";
import { InviteCarerForm } from "@/components/forms/invite-carer-form";
import { Card, EmptyState } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { listCarersByClientId } from "@/db/queries/carers";
import { listCheckInsByClientId } from "@/db/queries/check-ins";
import { countUnreadForUser } from "@/db/queries/messages";
import { getClientById } from "@/db/queries/clients";
import { getProgrammeByClientId, listVersionsByProgrammeId } from "@/db/queries/programmes";
import { requirePageActor } from "@/lib/auth/page-guards";
import { readPackStatus } from "@/lib/electrode-packs/read-status";
import type { ProgrammeContent } from "@/lib/programmes/content";
import { PackCard } from "./_components/pack-card";
import { SessionsCard } from "./_components/sessions-card";

export const metadata: Metadata = { title: "Today" };

const dayName = new Intl.DateTimeFormat("en-GB", { weekday: "long", day: "numeric", month: "long", timeZone: "Europe/London" });
const longDate = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "UTC" });
const londonToday = () => new Intl.DateTimeFormat("en-CA", { timeZone: "Europe/London" }).format(new Date());
const RECENT_MS = 14 * 24 * 60 * 60 * 1000;

export default async function TodayPage() {
  const actor = await requirePageActor("client", "carer");
  const client = actor.clientId ? await getClientById(actor.clientId) : null;
  if (!client) {
    return (
      <Notice tone="warning" word="Not linked yet">
        Your account is not linked to a client record. Contact your clinic, {actor.clinicName}.
      </Notice>
    );
  }
  const today = londonToday();
  const programme = await getProgrammeByClientId(client.id);
  const versions = programme ? await listVersionsByProgrammeId(programme.id) : [];
  const current = versions[0];
  const content = current ? (current.version.content as ProgrammeContent) : null;
  const [doneToday, carers, pack, unread] = await Promise.all([
    current ? listCheckInsByClientId(client.id, { from: today }) : Promise.resolve([]),
    actor.role === "client" ? listCarersByClientId(client.id) : Promise.resolve([]),
    content ? readPackStatus(client.id, content.schedule.replaceElectrodesAfterUses ?? null) : Promise.resolve(null),
    countUnreadForUser(actor.userId, [client.id]),
  ]);
  const firstName = actor.name.split(" ")[0];
  const recentlyChanged = current !== undefined && versions.length > 1 && current.version.publishedAt.getTime() > new Date(`${today}T00:00:00Z`).getTime() - RECENT_MS;
  const whose = actor.role === "carer" ? `${client.fullName}'s` : "Your";
  return (
    <div className="flex flex-col gap-6">
      <div>
        <p className="text-ink-soft">{dayName.format(new Date())}</p>
        <h1 className="text-3xl">Hello, {firstName}</h1>
        {actor.role === "carer" ? <p className="mt-1">You are helping {client.fullName}.</p> : null}
      </div>
      {unread > 0 ? (
        <Notice tone="note" word={unread === 1 ? "1 new message" : `${unread} new messages`}>
          <Link href="/messages">Read {unread === 1 ? "it" : "them"}</Link>.
        </Notice>
      ) : null}
      {current && recentlyChanged ? (
        <Notice tone="note" word="Programme changed">
          {whose} therapist published version {current.version.number} on {longDate.format(current.version.publishedAt)}.{" "}
          <Link href="/programme">See what changed</Link> and set the stimulator to match before the next session.
        </Notice>
      ) : null}
      {content ? (
        <>
          <SessionsCard planned={content.schedule.sessionsPerDay} done={doneToday.filter((row) => row.checkIn.sessionDate === today).length} minutes={content.schedule.minutesPerSession} />
          <p>
            Next review with {whose === "Your" ? "your" : "the"} therapist: <strong>{longDate.format(new Date(content.schedule.reviewOn))}</strong>.{" "}
            <Link href="/history">{whose} history</Link>
          </p>
          {pack ? <PackCard clientId={client.id} status={pack} today={today} /> : null}
        </>
      ) : (
        <Card title="Today's sessions">
          <EmptyState title="No programme yet">
            {whose} therapist has not published a programme yet. When they do, today&apos;s sessions appear here and you
            get an e-mail to say so.
          </EmptyState>
        </Card>
      )}
      {actor.role === "client" ? (
        <Card title="People who help you">
          <CarerList carers={carers} clientName="you" />
          <div className="mt-6">
            <h3 className="mb-3 text-lg">Invite a carer</h3>
            <p className="mb-4 text-ink-soft">
              A carer can do everything you can in Rampline, on your behalf. Everything they do is recorded as done by
              them.
            </p>
            <InviteCarerForm clientId={client.id} clientName={client.fullName} asTherapist={false} />
          </div>
        </Card>
      ) : null}
    </div>
  );
}
