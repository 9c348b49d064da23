import { eq } from "drizzle-orm";
import type { Database } from "../client";
import { organization } from "../schema";
import { getProgrammeByClientId, getLatestVersionByProgrammeId } from "../queries/programmes";
import { getLatestScreeningByClientId } from "../queries/screenings";
import { listConsentEventsByClientId } from "../queries/consents";
import type { Actor } from "@/lib/auth/actor";
import { recordConsent } from "@/lib/consents/record-consent";
import { markerInZone } from "@/lib/placement";
import { publishProgramme } from "@/lib/programmes/publish";
import { saveDraft } from "@/lib/programmes/save-draft";
import { BUILT_IN_TEMPLATES, programmeFromTemplate } from "@/lib/programmes/templates";
import { signScreening } from "@/lib/screening/sign";
import { processImage } from "@/lib/uploads/process-image";
import { savePhoto } from "@/lib/uploads/save-photo";
import { demoClinic, demoClients, demoTherapists } from "./demo-clinic";
import { demoPlacementIllustration } from "./demo-photo";
import { demoScreeningAnswers } from "./demo-screening-answers";

// Demo consents, screenings and programmes (Callum's second version comes with his check-ins, in reply to one), made through Rampline's own commands so they pass the same checks as
// real ones. Each step runs only if its result is missing, so a second run adds nothing.

const CONTACT = { phone: "0161 496 0732", email: "neuro-team@larkmoor.example", address: "Larkmoor Health Centre, 2 Weir Lane, Larkmoor" };

function therapistActor(key: string): Actor {
  const person = demoTherapists.find((t) => t.key === key)!;
  return { userId: `demo-${key}`, name: person.name, email: person.email, role: "therapist", organizationId: demoClinic.id, clinicName: demoClinic.name, clientId: null };
}

async function ensureConsents(therapist: Actor, clientId: string) {
  if ((await listConsentEventsByClientId(clientId)).length > 0) return 0;
  for (const kind of ["treatment", "remote-monitoring", "photos-care"] as const) {
    await recordConsent(therapist, clientId, { kind, status: "given", method: "written", note: "Signed consent form, scanned to the clinic record." });
  }
  return 3;
}

async function ensureScreening(therapist: Actor, clientId: string, answers: Parameters<typeof demoScreeningAnswers>[0]) {
  if (await getLatestScreeningByClientId(clientId)) return 0;
  await signScreening(therapist, clientId, demoScreeningAnswers(answers));
  return 1;
}

async function ensurePublished(therapist: Actor, clientId: string, versions: { mutate: (values: ReturnType<typeof programmeFromTemplate>) => void; reason: string }[], templateId: string, photo: boolean) {
  const existing = await getProgrammeByClientId(clientId);
  if (existing && (await getLatestVersionByProgrammeId(existing.id))) return 0;
  const values = programmeFromTemplate(BUILT_IN_TEMPLATES.find((t) => t.id === templateId)!.channels);
  if (photo) {
    const image = await processImage(await demoPlacementIllustration());
    const saved = await savePhoto({ organizationId: demoClinic.id, clientId, kind: "placement", uploadedById: therapist.userId, image });
    values.channels[0]!.photoIds = [saved.id];
  }
  let revision = existing?.draftRevision ?? 0;
  for (const version of versions) {
    version.mutate(values);
    revision = (await saveDraft(therapist, clientId, { values, baseRevision: revision })).revision;
    await publishProgramme(therapist, clientId, { reason: version.reason, baseRevision: revision });
  }
  return versions.length;
}

export async function seedDemoProgrammes(database: Database): Promise<number> {
  let created = 0;
  const [clinic] = await database.select().from(organization).where(eq(organization.id, demoClinic.id));
  if (clinic && !clinic.metadata) {
    await database.update(organization).set({ metadata: JSON.stringify(CONTACT) }).where(eq(organization.id, demoClinic.id));
    created++;
  }
  const priya = therapistActor("priya");
  const owen = therapistActor("owen");
  const id = (key: string) => `demo-client-${demoClients.find((c) => c.key === key)!.key}`;

  // Arthur: right-sided weakness after a stroke; one published programme with a placement illustration.
  created += await ensureConsents(priya, id("arthur"));
  created += await ensureScreening(priya, id("arthur"), { diagnosis: "Ischaemic stroke, left hemisphere", side: "right", site: "Right forearm, back of the arm", onsetDaysAgo: 120 });
  created += await ensurePublished(priya, id("arthur"), [
    {
      reason: "First programme after screening and the in-clinic test.",
      mutate: (v) => {
        v.channels[0]!.side = "right";
        v.channels[0]!.markers = [markerInZone("right-forearm-dorsal"), markerInZone("right-wrist-dorsal")];
        v.channels[0]!.placementNote = "Electrode A a hand's width below the elbow on the back of the forearm; B two finger-widths above the wrist.";
      },
    },
  ], "wrist-finger-extension", true);

  // Brenda: screened with a pacemaker; publishing waits for the cardiology team's clearance.
  created += await ensureConsents(priya, id("brenda"));
  created += await ensureScreening(priya, id("brenda"), { diagnosis: "Haemorrhagic stroke, right hemisphere", side: "left", site: "Left shoulder", onsetDaysAgo: 60, pacemaker: true });

  // Callum: two channels for grasp and release, then a second version with shorter pulses.
  created += await ensureConsents(owen, id("callum"));
  created += await ensureScreening(owen, id("callum"), { diagnosis: "Traumatic brain injury", side: "left", site: "Left forearm", onsetDaysAgo: 300 });
  created += await ensurePublished(owen, id("callum"), [
    {
      reason: "Grasp and release practice, first programme.",
      mutate: (v) => {
        v.channels.forEach((channel) => (channel.side = "left"));
        v.channels[0]!.markers = [markerInZone("left-forearm-palmar"), markerInZone("left-wrist-palmar")];
        v.channels[1]!.markers = [markerInZone("left-forearm-dorsal"), markerInZone("left-wrist-dorsal")];
      },
    },
  ], "grasp-and-release", false);
  return created;
}
