import type { Metadata } from "next";
import Link from "next/link";
import { EmptyState } from "@/components/ui/card";
import { getClinicById } from "@/db/queries/clinics";
import { getProgrammeByClientId, listVersionsByProgrammeId } from "@/db/queries/programmes";
import { confirmationStatus } from "@/lib/confirmations/read-confirmations";
import { requireOwnClient } from "@/lib/auth/own-client";
import type { ProgrammeContent } from "@/lib/programmes/content";
import { zoneLabelForMarker } from "@/lib/programmes/zone-names";
import { CheckInForm, type CheckInChannel } from "./_components/check-in-form";

export const metadata: Metadata = { title: "Log a session" };

const londonToday = () => new Intl.DateTimeFormat("en-CA", { timeZone: "Europe/London" }).format(new Date());

export default async function CheckInPage({ searchParams }: { searchParams: Promise<{ minutes?: string }> }) {
  const { actor, client } = await requireOwnClient();
  const programme = await getProgrammeByClientId(client.id);
  const versions = programme ? await listVersionsByProgrammeId(programme.id) : [];
  const version = versions[0]?.version ?? null;
  if (!version) {
    return (
      <EmptyState title="Nothing to log yet">
        There is no programme yet. <Link href="/today">Back to today</Link>
      </EmptyState>
    );
  }
  const content = version.content as ProgrammeContent;
  const clinic = await getClinicById(client.organizationId);
  const channels: CheckInChannel[] = content.channels.map((channel, index) => ({
    id: channel.id,
    number: index + 1,
    target: channel.target,
    ceilingMa: channel.settings.amplitudeCeilingMa,
    electrodes: [zoneLabelForMarker(channel.markers[0]), zoneLabelForMarker(channel.markers[1])],
  }));
  const minutes = Number((await searchParams).minutes);
  // Until someone confirms the stimulator matches the new version, the log asks which settings were used. The
  // choice is offered when both versions have the same channels, so the same form fits either.
  const previous = versions[1]?.version;
  const sameChannels = previous && (previous.content as ProgrammeContent).channels.map((c) => c.id).join() === content.channels.map((c) => c.id).join();
  const unconfirmed = previous ? !(await confirmationStatus(client.id, version.id)).anyConfirmed : false;
  const versionChoice = unconfirmed && sameChannels && previous ? { current: version.number, previous: previous.number } : null;
  return (
    <div className="flex flex-col gap-6">
      <div>
        <h1 className="text-3xl">Log a session</h1>
        <p className="mt-1 text-ink-soft">
          {actor.role === "carer" ? `For ${client.fullName}, recorded as your entry.` : "Tell your therapist how it went."} Programme version{" "}
          {version.number}.
        </p>
      </div>
      <CheckInForm
        clientId={client.id}
        today={londonToday()}
        defaultMinutes={Number.isInteger(minutes) && minutes > 0 ? minutes : content.schedule.minutesPerSession}
        channels={channels}
        clinicPhone={clinic?.contact.phone ?? null}
        versionNumber={version.number}
        versionChoice={versionChoice}
      />
    </div>
  );
}
