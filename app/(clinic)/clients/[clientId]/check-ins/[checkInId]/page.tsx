import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { settingsRows } from "@/components/programme-view/plain-words";
import { Card } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { getCheckInById } from "@/db/queries/check-ins";
import { listFlagsByClientId } from "@/db/queries/flags";
import { getProgrammeVersionById } from "@/db/queries/programmes";
import { requirePageClientAccess } from "@/lib/auth/page-guards";
import { icdrgReading, SKIN_SCALE, type SkinLevel } from "@/lib/check-ins/skin-scale";
import type { ProgrammeContent } from "@/lib/programmes/content";

export const metadata: Metadata = { title: "Check-in" };

const when = new Intl.DateTimeFormat("en-GB", { dateStyle: "long", timeZone: "UTC" });
const MOVEMENT = { full: "Full movement", partial: "Some movement", none: "No movement" } as const;
const FATIGUE = { none: "Not tired", mild: "A little tired", moderate: "Quite tired", severe: "Very tired" } as const;
const CONDITION = { fine: "Stuck well", "edges-lifting": "Edges lifting", "poor-sticking": "Not sticking well" } as const;

// One session as the therapist reviews it: what was reported, the photos, and the settings of the version it was
// measured against, side by side.
export default async function CheckInPage({ params }: { params: Promise<{ clientId: string; checkInId: string }> }) {
  const { clientId, checkInId } = await params;
  const { client } = await requirePageClientAccess(clientId, "therapist", "admin");
  const found = await getCheckInById(checkInId);
  if (!found || found.checkIn.clientId !== client.id) notFound();
  const { checkIn, loggedByName, versionNumber } = found;
  const version = checkIn.programmeVersionId ? await getProgrammeVersionById(checkIn.programmeVersionId) : null;
  const content = version?.content as ProgrammeContent | undefined;
  const flags = (await listFlagsByClientId(client.id)).filter((flag) => flag.checkInId === checkIn.id);
  const channelName = (id: string) => `Channel ${(content?.channels.findIndex((c) => c.id === id) ?? -1) + 1}`;
  return (
    <div className="flex flex-col gap-6">
      <p>
        <Link href={`/clients/${client.id}`}>← {client.fullName}</Link>
      </p>
      <div>
        <h1 className="text-3xl">Session of {when.format(new Date(checkIn.sessionDate))}</h1>
        <p className="mt-1 text-ink-soft">
          Logged by {loggedByName}
          {checkIn.loggedByRole === "carer" ? " (carer, on the client's behalf)" : " (the client)"} · against programme version {versionNumber ?? "?"}
        </p>
      </div>
      <p className="flex flex-wrap gap-4">
        <Link href={`/clients/${client.id}/messages?about=check-in:${checkIn.id}`}>Reply about this session</Link>
        <Link href={`/clients/${client.id}/programme?prompt=check-in:${checkIn.id}`}>Propose a change</Link>
      </p>
      {flags.map((flag) => (
        <Notice key={flag.id} tone={flag.severity === "urgent" ? "blocks" : "warning"} word={flag.severity === "urgent" ? "Urgent" : "Review"} title={flag.title}>
          Status: {flag.status}.
        </Notice>
      ))}
      <div className="grid gap-6 lg:grid-cols-2">
        <Card title="What was reported">
          <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 tabular-nums">
            <dt className="font-bold">Minutes</dt>
            <dd>{checkIn.minutes}</dd>
            <dt className="font-bold">Comfort</dt>
            <dd>{checkIn.comfort}/10</dd>
            <dt className="font-bold">Movement</dt>
            <dd>{MOVEMENT[checkIn.movement]}</dd>
            <dt className="font-bold">Fatigue</dt>
            <dd>{FATIGUE[checkIn.fatigue]}</dd>
            <dt className="font-bold">Electrodes</dt>
            <dd>{CONDITION[checkIn.electrodeCondition]}</dd>
            {checkIn.channels.map((channel) => (
              <div key={channel.channelId} className="contents">
                <dt className="font-bold">{channelName(channel.channelId)} strength</dt>
                <dd>
                  {channel.amplitudeMa} mA
                  {content ? ` (ceiling ${content.channels.find((c) => c.id === channel.channelId)?.settings.amplitudeCeilingMa} mA)` : ""}
                </dd>
              </div>
            ))}
          </dl>
          {checkIn.notes ? <p className="mt-3">“{checkIn.notes}”</p> : null}
        </Card>
        <Card title="Skin under each electrode">
          <ul className="flex flex-col gap-4">
            {checkIn.skin.map((site) => (
              <li key={`${site.channelId}-${site.electrode}`}>
                <p className="font-bold">
                  {channelName(site.channelId)}, electrode {site.electrode}: level {site.level}, {SKIN_SCALE[site.level as SkinLevel].words.toLowerCase()}
                </p>
                <p className="text-sm text-ink-soft">ICDRG reading: {icdrgReading(site.level as SkinLevel, site.spreads, site.itch)}</p>
                {site.photoIds.length > 0 ? (
                  <ul className="mt-2 flex flex-wrap gap-2">
                    {site.photoIds.map((id, index) => (
                      <li key={id}>
                        {/* eslint-disable-next-line @next/next/no-img-element -- private, authorised images */}
                        <img src={`/api/photos/${encodeURIComponent(id)}`} alt={`Skin under ${channelName(site.channelId).toLowerCase()}, electrode ${site.electrode}, photo ${index + 1}`} className="max-h-64 rounded border border-line" />
                      </li>
                    ))}
                  </ul>
                ) : null}
              </li>
            ))}
          </ul>
        </Card>
      </div>
      {content ? (
        <Card title={`Settings of version ${versionNumber}`}>
          <div className="grid gap-6 md:grid-cols-2">
            {content.channels.map((channel, index) => (
              <table key={channel.id} className="w-full text-left tabular-nums">
                <caption className="text-left font-bold">
                  Channel {index + 1}: {channel.target}
                </caption>
                <tbody>
                  {settingsRows(channel).map(([label, value]) => (
                    <tr key={label} className="border-b border-line-soft align-top">
                      <th scope="row" className="py-1 pr-3">{label}</th>
                      <td className="py-1">{value}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            ))}
          </div>
        </Card>
      ) : null}
    </div>
  );
}
