// A client with a published one-channel programme, and check-in input for it. Invented test data.
import type { CheckInInput } from "@/lib/check-ins/schema";
import { publishProgramme } from "@/lib/programmes/publish";
import { saveDraft } from "@/lib/programmes/save-draft";
import { createClinic, createPerson } from "./factories";
import { prepareClient, publishableValues } from "./programmes";

export async function clientWithProgramme() {
  const clinic = await createClinic("Check-in clinic");
  const therapist = await createPerson(clinic, "therapist");
  const client = await createPerson(clinic, "client", { therapistId: therapist.userId });
  const carer = await createPerson(clinic, "carer", { clientId: client.clientId! });
  await prepareClient(therapist, client.clientId!);
  const { revision } = await saveDraft(therapist, client.clientId!, { values: publishableValues(), baseRevision: 0 });
  await publishProgramme(therapist, client.clientId!, { reason: "First programme", baseRevision: revision });
  return { clinic, therapist, client, carer, clientId: client.clientId! };
}

export function today(): string {
  return new Date().toISOString().slice(0, 10);
}

export function checkInInput(overrides: Partial<CheckInInput> = {}, skinLevel = 1): CheckInInput {
  return {
    sessionDate: today(),
    minutes: 30,
    comfort: 7,
    movement: "partial",
    fatigue: "mild",
    channels: [{ channelId: "ch-1", amplitudeMa: 18 }],
    skin: [
      { channelId: "ch-1", electrode: "A", level: 1, spreads: false, itch: false, photoIds: [] },
      { channelId: "ch-1", electrode: "B", level: skinLevel, spreads: false, itch: false, photoIds: [] },
    ],
    electrodeCondition: "fine",
    ...overrides,
  };
}
