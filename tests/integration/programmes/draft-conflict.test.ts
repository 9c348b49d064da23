import { describe, expect, it } from "vitest";
import { getProgrammeByClientId } from "@/db/queries/programmes";
import { AppError } from "@/lib/errors";
import { emptyProgramme } from "@/lib/programmes/form-values";
import { saveDraft } from "@/lib/programmes/save-draft";
import { createClinic, createPerson } from "../../support/factories";

describe("two therapists editing one draft", () => {
  it("refuses the second save made from a stale revision, so neither overwrites the other", async () => {
    const clinic = await createClinic();
    const priya = await createPerson(clinic, "therapist");
    const owen = await createPerson(clinic, "therapist");
    const client = await createPerson(clinic, "client", { therapistId: priya.userId });

    const fromPriya = emptyProgramme();
    fromPriya.channels[0]!.target = "Wrist and finger extensors";
    const fromOwen = emptyProgramme();
    fromOwen.channels[0]!.target = "Triceps";

    // Both opened the builder at revision 0.
    const first = await saveDraft(priya, client.clientId!, { values: fromPriya, baseRevision: 0 });
    expect(first.revision).toBe(1);
    const refused = await saveDraft(owen, client.clientId!, { values: fromOwen, baseRevision: 0 }).catch((error: unknown) => error);
    expect(refused).toBeInstanceOf(AppError);
    expect((refused as AppError).code).toBe("CONFLICT");
    expect((refused as AppError).message).toContain(priya.name);

    const stored = await getProgrammeByClientId(client.clientId!);
    expect(stored!.draftRevision).toBe(1);
    expect((stored!.draft as typeof fromPriya).channels[0]!.target).toBe("Wrist and finger extensors");

    // After reloading, Owen saves on top of Priya's revision.
    const again = await saveDraft(owen, client.clientId!, { values: fromOwen, baseRevision: 1 });
    expect(again.revision).toBe(2);
  });

  it("keeps the draft to staff of the client's clinic", async () => {
    const clinic = await createClinic();
    const elsewhere = await createClinic("Other");
    const client = await createPerson(clinic, "client");
    const outsider = await createPerson(elsewhere, "therapist");
    const error = await saveDraft(outsider, client.clientId!, { values: emptyProgramme(), baseRevision: 0 }).catch((caught: unknown) => caught);
    expect((error as AppError).code).toBe("NOT_FOUND");
    const self = await saveDraft(client, client.clientId!, { values: emptyProgramme(), baseRevision: 0 }).catch((caught: unknown) => caught);
    expect((self as AppError).code).toBe("FORBIDDEN");
  });

  it("refuses a draft that is not in the builder's shape", async () => {
    const clinic = await createClinic();
    const therapist = await createPerson(clinic, "therapist");
    const client = await createPerson(clinic, "client", { therapistId: therapist.userId });
    const tooMany = emptyProgramme();
    tooMany.channels = [0, 1, 2, 3, 4].map(() => structuredClone(tooMany.channels[0]!));
    const error = await saveDraft(therapist, client.clientId!, { values: tooMany, baseRevision: 0 }).catch((caught: unknown) => caught);
    expect((error as AppError).code).toBe("VALIDATION");
    expect((error as AppError).fields?.["values.channels"]).toMatch(/at most 4/);
    expect(await getProgrammeByClientId(client.clientId!)).toBeNull();
  });
});
