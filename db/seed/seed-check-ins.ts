import { eq } from "drizzle-orm";
import type { Database } from "../client";
import { checkIn, programme, programmeVersion } from "../schema";
import { getProgrammeByClientId, getLatestVersionByProgrammeId, listVersionsByProgrammeId } from "../queries/programmes";
import type { Actor } from "@/lib/auth/actor";
import { logCheckIn } from "@/lib/check-ins/log-check-in";
import { confirmVersion } from "@/lib/confirmations/confirm-version";
import type { CheckInInput } from "@/lib/check-ins/schema";
import type { ProgrammeContent } from "@/lib/programmes/content";
import { contentToFormValues } from "@/lib/programmes/form-values";
import { publishProgramme } from "@/lib/programmes/publish";
import { saveDraft } from "@/lib/programmes/save-draft";
import { processImage } from "@/lib/uploads/process-image";
import { savePhoto } from "@/lib/uploads/save-photo";
import { demoCarers, demoClients, demoClinic, demoTherapists } from "./demo-clinic";
import { demoRednessIllustration } from "./demo-photo";

// Several weeks of invented session logs, through the app's own check-in command, and for Callum the skin report that
// led to his second programme version. The demo's programmes are dated back so the weeks line up with the logs.
const DAY = 24 * 60 * 60 * 1000;
const dayAgo = (n: number) => new Date(Date.now() - n * DAY).toISOString().slice(0, 10);

function actor(person: { key: string; name: string; email: string }, role: Actor["role"], clientId: string | null): Actor {
  return { userId: `demo-${person.key}`, name: person.name, email: person.email, role, organizationId: demoClinic.id, clinicName: demoClinic.name, clientId };
}

async function backdate(database: Database, clientId: string, number: number, daysAgo: number) {
  const [row] = await database.select().from(programme).where(eq(programme.clientId, clientId));
  if (!row) return;
  const versions = await listVersionsByProgrammeId(row.id);
  const version = versions.find((v) => v.version.number === number);
  if (version) await database.update(programmeVersion).set({ publishedAt: new Date(Date.now() - daysAgo * DAY) }).where(eq(programmeVersion.id, version.version.id));
}

function sessionInput(content: ProgrammeContent, day: string, n: number, skin: Partial<Record<string, number>> = {}, photoIds: Record<string, string[]> = {}): CheckInInput {
  return {
    sessionDate: day,
    minutes: n % 5 === 0 ? 20 : content.schedule.minutesPerSession,
    comfort: 6 + (n % 3),
    movement: n > 10 ? "partial" : "none",
    fatigue: n % 4 === 0 ? "moderate" : "mild",
    channels: content.channels.map((channel) => ({ channelId: channel.id, amplitudeMa: Math.min(channel.settings.amplitudeCeilingMa, 12 + n) })),
    skin: content.channels.flatMap((channel) =>
      (["A", "B"] as const).map((electrode) => ({ channelId: channel.id, electrode, level: skin[`${channel.id}${electrode}`] ?? (n % 3 === 0 ? 2 : 1), spreads: false, itch: false, photoIds: photoIds[`${channel.id}${electrode}`] ?? [] })),
    ),
    electrodeCondition: "fine",
  };
}

async function hasCheckIns(database: Database, clientId: string) {
  return (await database.select({ id: checkIn.id }).from(checkIn).where(eq(checkIn.clientId, clientId)).limit(1)).length > 0;
}

export async function seedDemoCheckIns(database: Database): Promise<number> {
  let created = 0;
  const arthur = demoClients.find((c) => c.key === "arthur")!;
  const arthurId = "demo-client-arthur";
  const arthurProgramme = await getProgrammeByClientId(arthurId);
  if (arthurProgramme && !(await hasCheckIns(database, arthurId))) {
    await backdate(database, arthurId, 1, 21);
    const content = (await getLatestVersionByProgrammeId(arthurProgramme.id))!.content as ProgrammeContent;
    const grace = demoCarers.find((c) => c.key === "grace")!;
    // Most days for three weeks, a few missed; his daughter logs some of them for him.
    for (let n = 20; n >= 1; n--) {
      if (n % 6 === 0) continue;
      const who = n % 4 === 0 ? actor(grace, "carer", arthurId) : actor(arthur, "client", arthurId);
      await logCheckIn(who, arthurId, sessionInput(content, dayAgo(n), 21 - n));
      created++;
    }
  }

  const callum = demoClients.find((c) => c.key === "callum")!;
  const callumId = "demo-client-callum";
  const callumProgramme = await getProgrammeByClientId(callumId);
  // Only where Callum's programme is still at version 1: the story below publishes version 2 in reply to a report.
  const callumVersions = callumProgramme ? await listVersionsByProgrammeId(callumProgramme.id) : [];
  if (callumProgramme && callumVersions.length === 1 && !(await hasCheckIns(database, callumId))) {
    const owen = actor(demoTherapists.find((t) => t.key === "owen")!, "therapist", null);
    const you = actor(callum, "client", callumId);
    await backdate(database, callumId, 1, 24);
    const v1 = (await getLatestVersionByProgrammeId(callumProgramme.id))!;
    const content = v1.content as ProgrammeContent;
    for (let n = 23; n >= 9; n--) {
      await logCheckIn(you, callumId, sessionInput(content, dayAgo(n), 24 - n));
      created++;
    }
    // Redness under channel 1 that lasted into the evening, with a photo (a drawn illustration, not real skin).
    const image = await processImage(await demoRednessIllustration());
    const photo = await savePhoto({ organizationId: demoClinic.id, clientId: callumId, kind: "skin", uploadedById: you.userId, image });
    const report = await logCheckIn(you, callumId, sessionInput(content, dayAgo(8), 16, { "ch-1B": 3 }, { "ch-1B": [photo.id] }));
    created++;
    // Owen's reply: shorter pulses on channel 1, as version 2, linked to the report.
    const values = contentToFormValues(content);
    values.channels[0]!.settings.phaseDurationUs = "250";
    const { revision } = await saveDraft(owen, callumId, { values, baseRevision: (await getProgrammeByClientId(callumId))!.draftRevision });
    await publishProgramme(owen, callumId, { reason: "Redness lasting into the evening under channel 1, electrode B: pulse duration reduced.", baseRevision: revision, promptedBy: { type: "check-in", id: report.checkInId } });
    await backdate(database, callumId, 2, 7);
    await confirmVersion(you, callumId, { versionNumber: 2 });
    const v2 = (await getLatestVersionByProgrammeId(callumProgramme.id))!.content as ProgrammeContent;
    for (let n = 6; n >= 1; n--) {
      await logCheckIn(you, callumId, sessionInput(v2, dayAgo(n), 24 - n));
      created++;
    }
  }
  return created;
}
