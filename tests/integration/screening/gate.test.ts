import { describe, expect, it } from "vitest";
import { getPublishingGate } from "@/lib/screening/gate";
import { recordRedFlagClearance } from "@/lib/screening/record-clearance";
import { signScreening } from "@/lib/screening/sign";
import { cleanAnswers, clinicWithClient, withPacemaker, withPrecautions } from "./helpers";

const pacemakerReason = "Pacemaker, defibrillator or other active implant: record a named clinician's clearance before publishing.";

// The publishing gate: only the latest signed screening counts. source: PRODUCT.md capability 2 — systemic red flags
// block publishing until a clearance is recorded.
describe("the publishing gate", () => {
  it("is shut until a screening is signed", async () => {
    const { clientId } = await clinicWithClient();
    expect(await getPublishingGate(clientId)).toEqual({ ok: false, reasons: ["Sign a screening before publishing."], latest: null });
  });

  it("opens for a clean screening and returns its summary", async () => {
    const { therapist, clientId } = await clinicWithClient();
    await signScreening(therapist, clientId, cleanAnswers());
    const gate = await getPublishingGate(clientId);
    expect(gate).toMatchObject({ ok: true, reasons: [] });
    expect(gate.latest).toMatchObject({ version: 1, outcome: "eligible", outcomeLabel: "Eligible", signedByName: therapist.name, redFlags: [], concerns: [] });
  });

  it("stays shut for a red flag, naming it, until its clearance is recorded", async () => {
    const { therapist, clientId } = await clinicWithClient();
    const { screeningId } = await signScreening(therapist, clientId, withPacemaker());
    const shut = await getPublishingGate(clientId);
    expect(shut).toMatchObject({ ok: false, reasons: [pacemakerReason] });
    expect(shut.latest?.redFlags).toEqual([{ id: "active-implant", label: "Pacemaker, defibrillator or other active implant", clearance: null }]);

    await recordRedFlagClearance(therapist, clientId, screeningId, { flag: "active-implant", clinicianName: "Dr Ama Okafor, cardiologist", note: "Cleared in writing." });
    const open = await getPublishingGate(clientId);
    expect(open).toMatchObject({ ok: true, reasons: [] });
    expect(open.latest?.redFlags[0]?.clearance).toMatchObject({ clinicianName: "Dr Ama Okafor, cardiologist", recordedByName: therapist.name });
  });

  it("gives one reason per uncleared flag", async () => {
    const { therapist, clientId } = await clinicWithClient();
    const answers = withPacemaker();
    const { screeningId } = await signScreening(therapist, clientId, { ...answers, redFlags: { ...answers.redFlags, pregnancy: "yes" } });
    expect((await getPublishingGate(clientId)).reasons).toEqual([pacemakerReason, "Pregnancy: record a named clinician's clearance before publishing."]);
    await recordRedFlagClearance(therapist, clientId, screeningId, { flag: "pregnancy", clinicianName: "Dr L. Amadi, obstetrician", note: "Arm stimulation agreed." });
    expect((await getPublishingGate(clientId)).reasons).toEqual([pacemakerReason]);
  });

  it("opens when a later screening no longer records the flag, and follows the latest version only", async () => {
    const { therapist, clientId } = await clinicWithClient();
    await signScreening(therapist, clientId, withPacemaker());
    await signScreening(therapist, clientId, cleanAnswers());
    expect(await getPublishingGate(clientId)).toMatchObject({ ok: true, reasons: [], latest: { version: 2 } });
    // …and a cleared flag on an old version does not carry over to a new version that records it again.
    await signScreening(therapist, clientId, withPacemaker());
    expect((await getPublishingGate(clientId)).reasons).toEqual([pacemakerReason]);
  });

  it("is shut while the latest outcome is not eligible", async () => {
    const { therapist, clientId } = await clinicWithClient();
    const answers = withPrecautions(cleanAnswers(), "Open wound over the forearm.");
    await signScreening(therapist, clientId, { ...answers, outcome: { result: "not-eligible", notes: "Open wound over the forearm." } });
    expect((await getPublishingGate(clientId)).reasons).toEqual([
      "The latest screening (version 1) records the client as not eligible: sign a new screening before publishing.",
    ]);
  });
});
