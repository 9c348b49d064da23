import { describe, expect, it } from "vitest";
import { POST as clearanceRoute } from "@/app/api/clients/[clientId]/screenings/[screeningId]/clearances/route";
import { recordRedFlagClearance } from "@/lib/screening/record-clearance";
import { signScreening } from "@/lib/screening/sign";
import { jsonRequest, params, sessionCookie } from "../../support/auth-requests";
import { createClinic, createPerson } from "../../support/factories";
import { auditOf, cleanAnswers, clearancesOf, clinicWithClient, expectAppError, withPacemaker } from "./helpers";

const clearance = { flag: "active-implant", clinicianName: "Dr Ama Okafor, cardiologist", note: "Letter of 3 March: forearm stimulation is compatible with the device." };
type ErrorJson = { error: { code: string; message: string; fields?: Record<string, string> } };

describe("recording a red-flag clearance", () => {
  it("records a named clinician's clearance once, with an audit event", async () => {
    const { therapist, clinic, clientId } = await clinicWithClient();
    const { screeningId } = await signScreening(therapist, clientId, withPacemaker());
    const result = await recordRedFlagClearance(therapist, clientId, screeningId, clearance);
    const rows = await clearancesOf(screeningId);
    expect(rows).toMatchObject([{ flag: "active-implant", clinicianName: clearance.clinicianName, note: clearance.note, recordedById: therapist.userId }]);
    const [event] = await auditOf(result.clearanceId, "screening.red-flag-cleared");
    expect(event).toMatchObject({
      actorUserId: therapist.userId,
      organizationId: clinic.organizationId,
      clientId,
      entityType: "red_flag_clearance",
      before: { screeningId, version: 1, flag: "active-implant", cleared: false },
      after: { screeningId, version: 1, flag: "active-implant", cleared: true, clinicianName: clearance.clinicianName, note: clearance.note },
    });
  });

  it("answers a second clearance of the same flag with 409, and keeps the first", async () => {
    const { therapist, clientId } = await clinicWithClient();
    const { screeningId } = await signScreening(therapist, clientId, withPacemaker());
    const cookie = await sessionCookie(therapist.email);
    const url = `/api/clients/${clientId}/screenings/${screeningId}/clearances`;
    expect((await clearanceRoute(jsonRequest(url, clearance, { cookie }), params({ clientId, screeningId }))).status).toBe(201);
    const again = await clearanceRoute(jsonRequest(url, { ...clearance, clinicianName: "Someone else" }, { cookie }), params({ clientId, screeningId }));
    expect(again.status).toBe(409);
    expect(((await again.json()) as ErrorJson).error.message).toBe("A clearance for this red flag is already recorded on this screening.");
    // Two at the same moment: the unique index refuses one of them, which is reported the same way.
    const { screeningId: next } = await signScreening(therapist, clientId, withPacemaker());
    const racing = await Promise.allSettled([1, 2].map(() => recordRedFlagClearance(therapist, clientId, next, clearance)));
    expect(racing.map((r) => r.status).sort()).toEqual(["fulfilled", "rejected"]);
    expect((await clearancesOf(screeningId)).map((row) => row.clinicianName)).toEqual([clearance.clinicianName]);
  });

  it("refuses a flag the screening does not record (400), an unknown flag (400) and another client's screening (404)", async () => {
    const { therapist, clinic, clientId } = await clinicWithClient();
    const { screeningId } = await signScreening(therapist, clientId, cleanAnswers());
    const notRecorded = await expectAppError(recordRedFlagClearance(therapist, clientId, screeningId, clearance), "VALIDATION");
    expect(notRecorded.fields?.flag).toBe("Screening version 1 does not record “Pacemaker, defibrillator or other active implant”, so there is nothing to clear.");
    const unknown = await expectAppError(recordRedFlagClearance(therapist, clientId, screeningId, { ...clearance, flag: "bad-knees" }), "VALIDATION");
    expect(unknown.fields?.flag).toBe("Choose the red flag this clearance is for.");
    const missing = await expectAppError(recordRedFlagClearance(therapist, clientId, screeningId, { flag: "pregnancy" }), "VALIDATION");
    expect(Object.keys(missing.fields ?? {}).sort()).toEqual(["clinicianName", "note"]);

    const otherClient = await createPerson(clinic, "client", { therapistId: therapist.userId });
    const { screeningId: theirs } = await signScreening(therapist, otherClient.clientId!, withPacemaker());
    await expectAppError(recordRedFlagClearance(therapist, clientId, theirs, clearance), "NOT_FOUND");
    expect(await clearancesOf(theirs)).toHaveLength(0);
  });

  it("lets only a therapist of the clinic record one", async () => {
    const { clinic, therapist, client, clientId } = await clinicWithClient();
    const { screeningId } = await signScreening(therapist, clientId, withPacemaker());
    const url = `/api/clients/${clientId}/screenings/${screeningId}/clearances`;
    const admin = await createPerson(clinic, "admin");
    for (const who of [admin, client]) {
      const response = await clearanceRoute(jsonRequest(url, clearance, { cookie: await sessionCookie(who.email) }), params({ clientId, screeningId }));
      expect(response.status, who.role).toBe(403);
    }
    const outsider = await createPerson(await createClinic("Other clinic"), "therapist");
    const foreign = await clearanceRoute(jsonRequest(url, clearance, { cookie: await sessionCookie(outsider.email) }), params({ clientId, screeningId }));
    expect(foreign.status).toBe(404);
    expect(await clearancesOf(screeningId)).toHaveLength(0);
  });
});
