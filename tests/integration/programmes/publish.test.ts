import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { auditEvent, programmeVersion } from "@/db/schema";
import { getProgrammeByClientId } from "@/db/queries/programmes";
import { AppError } from "@/lib/errors";
import { markerInZone } from "@/lib/placement";
import { publishProgramme } from "@/lib/programmes/publish";
import { saveDraft } from "@/lib/programmes/save-draft";
import { recordRedFlagClearance } from "@/lib/screening/record-clearance";
import { signScreening } from "@/lib/screening/sign";
import { createClinic, createPerson } from "../../support/factories";
import { prepareClient, publishableValues } from "../../support/programmes";
import { cleanAnswers } from "../../unit/screening/answers-fixture";
import { withPacemaker } from "../screening/helpers";

async function refusal(promise: Promise<unknown>) {
  const error = await promise.then(() => null, (caught: unknown) => caught);
  expect(error).toBeInstanceOf(AppError);
  return error as AppError;
}

async function setUp() {
  const clinic = await createClinic("Publishing clinic");
  const therapist = await createPerson(clinic, "therapist");
  const client = await createPerson(clinic, "client", { therapistId: therapist.userId });
  const carer = await createPerson(clinic, "carer", { clientId: client.clientId! });
  return { clinic, therapist, client, carer, clientId: client.clientId! };
}

async function queuedUpdateMailsTo(address: string) {
  const { rows } = await pool().query("SELECT data FROM pgboss.job WHERE name = 'email' AND data->>'to' = $1 AND data->>'template' = 'programme-updated'", [address]);
  return rows as { data: { data: Record<string, string> } }[];
}

describe("publishing a programme", () => {
  it("is blocked by a systemic red flag until a named clinician's clearance is recorded", async () => {
    const { therapist, clientId } = await setUp();
    const screening = await prepareClient(therapist, clientId, withPacemaker());
    const { revision } = await saveDraft(therapist, clientId, { values: publishableValues(), baseRevision: 0 });

    const blocked = await refusal(publishProgramme(therapist, clientId, { reason: "First programme", baseRevision: revision }));
    expect(blocked.code).toBe("BLOCKED");
    expect(blocked.reasons?.join(" ")).toMatch(/implant.*clearance/i);
    const programme = await getProgrammeByClientId(clientId);
    expect(await db().select().from(programmeVersion).where(eq(programmeVersion.programmeId, programme!.id))).toHaveLength(0);

    await recordRedFlagClearance(therapist, clientId, screening.screeningId, {
      flag: "active-implant",
      clinicianName: "Dr Imogen Hale, cardiologist",
      note: "Pacemaker is bipolar; stimulation of the forearm cleared in writing.",
    });
    const published = await publishProgramme(therapist, clientId, { reason: "First programme", baseRevision: revision });
    expect(published.number).toBe(1);
  });

  it("creates numbered, immutable versions with author, reason and a readable diff, and tells the client and carer", async () => {
    const { therapist, client, carer, clientId } = await setUp();
    await prepareClient(therapist, clientId);
    const first = await saveDraft(therapist, clientId, { values: publishableValues(), baseRevision: 0 });
    const v1 = await publishProgramme(therapist, clientId, { reason: "First programme after screening", baseRevision: first.revision });
    expect(v1).toMatchObject({ number: 1, changes: [] });

    const changed = publishableValues();
    changed.channels[0]!.settings.phaseDurationUs = "250";
    const second = await saveDraft(therapist, clientId, { values: changed, baseRevision: first.revision });
    const v2 = await publishProgramme(therapist, clientId, {
      reason: "Redness after sessions: shorter pulses",
      baseRevision: second.revision,
      promptedBy: { type: "check-in", id: "check-in-123" },
    });
    expect(v2.number).toBe(2);
    expect(v2.changes).toEqual(["Pulse duration, channel 1: 300 µs → 250 µs"]);

    const [row] = await db().select().from(programmeVersion).where(eq(programmeVersion.id, v2.versionId));
    expect(row).toMatchObject({ authorId: therapist.userId, reason: "Redness after sessions: shorter pulses", promptedByType: "check-in", promptedById: "check-in-123" });
    const audit = await db().select().from(auditEvent).where(and(eq(auditEvent.entityId, v2.versionId), eq(auditEvent.action, "programme.published")));
    expect(audit[0]).toMatchObject({ actorUserId: therapist.userId, before: { version: 1 } });

    for (const person of [client, carer]) {
      const mails = await queuedUpdateMailsTo(person.email);
      expect(mails).toHaveLength(2);
      // No clinical detail in the e-mail: only a name, the clinic and a link.
      expect(Object.keys(mails[0]!.data.data).sort()).toEqual(["clinicName", "name", "url"]);
    }
  });

  it("refuses a draft with a blocking finding, an electrode on the front of the neck, or no consent to treatment", async () => {
    const { therapist, clientId } = await setUp();
    await signScreening(therapist, clientId, cleanAnswers());
    const values = publishableValues();
    values.channels[0]!.settings.frequencyHz = "5000"; // pulses of 300 µs cannot fit a 200 µs period
    values.channels[0]!.markers = [markerInZone("front-neck"), markerInZone("left-forearm-palmar")];
    const { revision } = await saveDraft(therapist, clientId, { values, baseRevision: 0 });
    const blocked = await refusal(publishProgramme(therapist, clientId, { reason: "Try", baseRevision: revision }));
    const reasons = blocked.reasons!.join("\n");
    expect(reasons).toMatch(/Channel 1: Pulses overlap/);
    expect(reasons).toMatch(/neck/i);
    expect(reasons).toMatch(/consent to treatment/);
  });

  it("refuses to publish from a stale revision, or the same content twice", async () => {
    const { therapist, clientId } = await setUp();
    await prepareClient(therapist, clientId);
    const { revision } = await saveDraft(therapist, clientId, { values: publishableValues(), baseRevision: 0 });
    expect((await refusal(publishProgramme(therapist, clientId, { reason: "Stale", baseRevision: revision - 1 }))).code).toBe("CONFLICT");
    await publishProgramme(therapist, clientId, { reason: "First", baseRevision: revision });
    const again = await refusal(publishProgramme(therapist, clientId, { reason: "Same again", baseRevision: revision }));
    expect(again.message).toMatch(/Nothing has changed/);
  });

  it("is for therapists of the client's clinic only", async () => {
    const { clinic, clientId, client } = await setUp();
    const admin = await createPerson(clinic, "admin");
    const outsider = await createPerson(await createClinic("Other"), "therapist");
    expect((await refusal(publishProgramme(admin, clientId, { reason: "x", baseRevision: 0 }))).code).toBe("FORBIDDEN");
    expect((await refusal(publishProgramme(client, clientId, { reason: "x", baseRevision: 0 }))).code).toBe("FORBIDDEN");
    expect((await refusal(publishProgramme(outsider, clientId, { reason: "x", baseRevision: 0 }))).code).toBe("NOT_FOUND");
  });
});

describe("placement photos in a published version", () => {
  it("must be this client's own placement photos", async () => {
    const { therapist, clientId } = await setUp();
    await prepareClient(therapist, clientId);
    const values = publishableValues();
    values.channels[0]!.photoIds = ["no-such-photo"];
    const { revision } = await saveDraft(therapist, clientId, { values, baseRevision: 0 });
    const blocked = await refusal(publishProgramme(therapist, clientId, { reason: "With a stray photo", baseRevision: revision }));
    expect(blocked.reasons).toContain("Channel 1: a placement photo is missing or belongs to another record; remove it and add it again.");
  });
});
