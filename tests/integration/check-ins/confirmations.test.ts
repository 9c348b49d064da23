import { describe, expect, it } from "vitest";
import { listMessagesByClientId } from "@/db/queries/messages";
import { logCheckIn } from "@/lib/check-ins/log-check-in";
import { confirmVersion } from "@/lib/confirmations/confirm-version";
import { AppError } from "@/lib/errors";
import { contentToFormValues } from "@/lib/programmes/form-values";
import { publishProgramme } from "@/lib/programmes/publish";
import { saveDraft } from "@/lib/programmes/save-draft";
import { getProgrammeByClientId, getLatestVersionByProgrammeId } from "@/db/queries/programmes";
import type { ProgrammeContent } from "@/lib/programmes/content";
import { checkInInput, clientWithProgramme } from "../../support/check-ins";

async function publishShorterPulses(setup: Awaited<ReturnType<typeof clientWithProgramme>>) {
  const programme = (await getProgrammeByClientId(setup.clientId))!;
  const values = contentToFormValues((await getLatestVersionByProgrammeId(programme.id))!.content as ProgrammeContent);
  values.channels[0]!.settings.phaseDurationUs = "250";
  const { revision } = await saveDraft(setup.therapist, setup.clientId, { values, baseRevision: programme.draftRevision });
  return publishProgramme(setup.therapist, setup.clientId, { reason: "Redness: shorter pulses", baseRevision: revision, promptedBy: { type: "check-in", id: "x" } });
}

describe("a change the client must set on their stimulator", () => {
  it("shows the diff in the thread, asks which settings were used until confirmed, then not", async () => {
    const setup = await clientWithProgramme();
    await publishShorterPulses(setup);
    const thread = await listMessagesByClientId(setup.clientId);
    const published = thread.find((row) => row.message.kind === "system" && row.message.body.includes("version 2"));
    expect(published?.message.body).toContain("Pulse duration, channel 1: 300 µs → 250 µs");

    const unsure = await logCheckIn(setup.client, setup.clientId, checkInInput()).catch((error: unknown) => error);
    expect((unsure as AppError).fields?.versionNumber).toMatch(/which settings/);
    const onOld = await logCheckIn(setup.client, setup.clientId, checkInInput({ versionNumber: 1 }));
    expect(onOld.checkInId).toBeTruthy();

    await confirmVersion(setup.carer, setup.clientId, { versionNumber: 2 });
    expect((await listMessagesByClientId(setup.clientId)).some((row) => row.message.body.includes("confirmed that the stimulator now matches version 2"))).toBe(true);
    expect((await logCheckIn(setup.client, setup.clientId, checkInInput())).checkInId).toBeTruthy();
  });

  it("can only be confirmed for the version in force, by the client or a carer", async () => {
    const setup = await clientWithProgramme();
    await publishShorterPulses(setup);
    const stale = await confirmVersion(setup.client, setup.clientId, { versionNumber: 1 }).catch((error: unknown) => error);
    expect((stale as AppError).code).toBe("CONFLICT");
    const staff = await confirmVersion(setup.therapist, setup.clientId, { versionNumber: 2 }).catch((error: unknown) => error);
    expect((staff as AppError).code).toBe("FORBIDDEN");
    expect(await confirmVersion(setup.client, setup.clientId, { versionNumber: 2 })).toMatchObject({ already: false });
    expect(await confirmVersion(setup.client, setup.clientId, { versionNumber: 2 })).toMatchObject({ already: true });
  });
});
