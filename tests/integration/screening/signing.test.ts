import { describe, expect, it } from "vitest";
import { POST as signRoute } from "@/app/api/clients/[clientId]/screenings/route";
import { signScreening } from "@/lib/screening/sign";
import { jsonRequest, params, sessionCookie } from "../../support/auth-requests";
import { createClinic, createPerson } from "../../support/factories";
import { auditOf, cleanAnswers, clinicWithClient, expectAppError, screeningsOf, withPacemaker } from "./helpers";

type ErrorJson = { error: { code: string; message: string; fields?: Record<string, string> } };
const path = (clientId: string) => `/api/clients/${clientId}/screenings`;

describe("signing a screening", () => {
  it("creates version 1 and then version 2, each signed by the therapist at the time of signing", async () => {
    const { therapist, clientId } = await clinicWithClient();
    const before = Date.now();
    const first = await signScreening(therapist, clientId, cleanAnswers());
    const second = await signScreening(therapist, clientId, withPacemaker());
    expect([first.version, second.version]).toEqual([1, 2]);
    expect(second.redFlags).toEqual(["active-implant"]);
    const rows = await screeningsOf(clientId);
    expect(rows.map((row) => [row.version, row.outcome, row.signedById])).toEqual([
      [1, "eligible", therapist.userId],
      [2, "eligible-with-precautions", therapist.userId],
    ]);
    expect(rows[0]!.signedAt.getTime()).toBeGreaterThanOrEqual(before - 1000);
    expect(rows[1]!.rescreenOn).toBe(cleanAnswers().outcome.rescreenOn);
    expect(rows[1]!.answers).toMatchObject({ redFlags: { activeImplant: "yes" }, outcome: { notes: "Await the cardiologist's clearance." } });
  });

  it("writes a screening.signed audit event with the actor, the previous outcome before and the summary after", async () => {
    const { therapist, clinic, clientId } = await clinicWithClient();
    const first = await signScreening(therapist, clientId, cleanAnswers());
    const second = await signScreening(therapist, clientId, withPacemaker());
    const [firstEvent] = await auditOf(first.screeningId, "screening.signed");
    expect(firstEvent).toMatchObject({ actorUserId: therapist.userId, organizationId: clinic.organizationId, clientId, entityType: "screening", before: null });
    const [secondEvent] = await auditOf(second.screeningId, "screening.signed");
    expect(secondEvent!.before).toEqual({ version: 1, outcome: "eligible" });
    expect(secondEvent!.after).toMatchObject({ version: 2, outcome: "eligible-with-precautions", redFlags: ["active-implant"], signedById: therapist.userId });
  });

  it("gives concurrent signings distinct, consecutive version numbers", async () => {
    const { therapist, clientId } = await clinicWithClient();
    const other = await createPerson({ organizationId: therapist.organizationId, clinicName: therapist.clinicName }, "therapist");
    const results = await Promise.all([therapist, other, therapist, other].map((who) => signScreening(who, clientId, cleanAnswers())));
    expect(results.map((r) => r.version).sort()).toEqual([1, 2, 3, 4]);
    expect((await screeningsOf(clientId)).map((row) => row.version)).toEqual([1, 2, 3, 4]);
  });

  it("lets only a therapist of the client's clinic sign: others get 403, another clinic's therapist 404", async () => {
    const { clinic, therapist, client, clientId } = await clinicWithClient();
    const carer = await createPerson(clinic, "carer", { clientId });
    const admin = await createPerson(clinic, "admin");
    const outsider = await createPerson(await createClinic("Other clinic"), "therapist");
    for (const who of [client, carer, admin]) {
      const response = await signRoute(jsonRequest(path(clientId), cleanAnswers(), { cookie: await sessionCookie(who.email) }), params({ clientId }));
      expect(response.status, who.role).toBe(403);
      await expectAppError(signScreening(who, clientId, cleanAnswers()), "FORBIDDEN");
    }
    const foreign = await signRoute(jsonRequest(path(clientId), cleanAnswers(), { cookie: await sessionCookie(outsider.email) }), params({ clientId }));
    expect(foreign.status).toBe(404);
    expect(((await foreign.json()) as ErrorJson).error.message).toBe("That client was not found.");
    expect(await screeningsOf(clientId)).toHaveLength(0);

    const ok = await signRoute(jsonRequest(path(clientId), cleanAnswers(), { cookie: await sessionCookie(therapist.email) }), params({ clientId }));
    expect(ok.status).toBe(201);
    expect(await ok.json()).toMatchObject({ version: 1, outcome: "eligible", redFlags: [] });
  });

  it("answers bad input with 400 and a message per field, and saves nothing", async () => {
    const { therapist, clientId } = await clinicWithClient();
    const cookie = await sessionCookie(therapist.email);
    const answers = cleanAnswers();
    const broken = { ...answers, context: { ...answers.context, diagnosis: "" }, sites: [{ ...answers.sites[0], skinIntact: "maybe" }] };
    const response = await signRoute(jsonRequest(path(clientId), broken, { cookie }), params({ clientId }));
    expect(response.status).toBe(400);
    const { error } = (await response.json()) as ErrorJson;
    expect(error.code).toBe("VALIDATION");
    expect(error.fields).toEqual({
      "context.diagnosis": "Enter the diagnosis, for example “stroke, left hemisphere”.",
      "sites.0.skinIntact": "Say whether the skin at this site is intact.",
    });

    // An outcome the answers contradict is bad input too (common practice, no published source).
    const contradiction = await signRoute(jsonRequest(path(clientId), { ...withPacemaker(), outcome: answers.outcome }, { cookie }), params({ clientId }));
    expect(contradiction.status).toBe(400);
    expect(((await contradiction.json()) as ErrorJson).error.fields?.["outcome.result"]).toMatch(/Choose “Eligible with precautions” or “Not eligible”/);

    const notJson = await signRoute(jsonRequest(path(clientId), "{", { cookie }), params({ clientId }));
    expect(notJson.status).toBe(400);
    expect(await screeningsOf(clientId)).toHaveLength(0);
  });
});
