import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AcceptInvitationPage } from "./pages/accept-invitation-page";
import { CaseloadPage } from "./pages/caseload-page";
import { TeamPage } from "./pages/team-page";
import { TodayPage } from "./pages/today-page";
import { expectApiError } from "./support/api-errors";
import { MESSAGES } from "./support/form-messages";
import { invitationIdFrom, uniqueEmail } from "./support/people";
import { oversizedText, postRaw } from "./support/raw-requests";
import { assembleCast, type Cast } from "./support/validation-cast";

// The JSON routes behind the forms, called directly with a signed-in browser context's cookies: anything malformed
// is refused with the one error shape, and nothing is created.

let cast: Cast;
beforeAll(async () => {
  cast = await assembleCast();
});
afterAll(async () => {
  await cast?.close();
});

describe("the JSON routes refuse bad requests and create nothing", () => {
  it("inviting a client", async () => {
    const { request } = cast.therapist.context;
    const path = "/api/clients";
    // Each attempt carries its own address, so the caseload can show that none of them made a client.
    const [typed, asText, broken, huge] = [1, 2, 3, 4].map(() => uniqueEmail("api-client"));

    const missing = await expectApiError(await request.post(path, { data: {} }), 400, "VALIDATION");
    expect(Object.keys(missing.fields ?? {}).sort()).toEqual(["email", "fullName"]);
    const wrongTypes = await expectApiError(await request.post(path, { data: { fullName: 42, email: [typed] } }), 400, "VALIDATION");
    expect(wrongTypes.fields).toEqual({ fullName: "Enter a name.", email: "Enter an e-mail address." });

    const plainText = await postRaw(request, path, JSON.stringify({ fullName: "Idris Pennant", email: asText }), "text/plain");
    expect((await expectApiError(plainText, 415, "UNSUPPORTED_MEDIA_TYPE")).fields).toBeUndefined();
    const malformed = await postRaw(request, path, `{"fullName": "Idris Pennant", "email": "${broken}"`);
    expect((await expectApiError(malformed, 400, "BAD_REQUEST")).fields).toBeUndefined();
    const oversized = await postRaw(request, path, JSON.stringify({ fullName: oversizedText(), email: huge }));
    expect((await expectApiError(oversized, 413, "PAYLOAD_TOO_LARGE")).fields).toBeUndefined();

    const signedOut = (await cast.guestPage()).context().request;
    const anonymous = await signedOut.post(path, { data: { fullName: "Idris Pennant", email: typed } });
    await expectApiError(anonymous, 401, "UNAUTHENTICATED");

    const caseload = new CaseloadPage(cast.therapist.page);
    await caseload.open();
    const listed = (await caseload.clientRows().allTextContents()).join("\n");
    for (const address of [typed, asText, broken, huge]) expect(listed).not.toContain(address);
  });

  it("inviting a therapist", async () => {
    const { request } = cast.admin.context;
    const path = "/api/team/invitations";
    const address = uniqueEmail("api-therapist");
    const wrongType = await expectApiError(await request.post(path, { data: { name: ["Ffion"], email: address } }), 400, "VALIDATION");
    expect(Object.keys(wrongType.fields ?? {})).toEqual(["name"]);
    const asForm = await postRaw(request, path, `name=Ffion&email=${address}`, "application/x-www-form-urlencoded");
    await expectApiError(asForm, 415, "UNSUPPORTED_MEDIA_TYPE");

    const team = new TeamPage(cast.admin.page);
    await team.open();
    expect(await team.waitingInvitations().textContent()).not.toContain(address);
  });

  it("inviting a carer", async () => {
    const { request } = cast.client.context;
    const path = `/api/clients/${encodeURIComponent(cast.arthurPath.split("/").pop() ?? "")}/carers`;
    const address = uniqueEmail("api-carer");
    const body = { carerName: "Kofi Mensah", carerEmail: address, relationship: "Son", consentMethod: "in-app", consentConfirmed: "yes" };
    const wrongType = await expectApiError(await request.post(path, { data: body }), 400, "VALIDATION");
    expect(wrongType.fields).toEqual({ consentConfirmed: MESSAGES.missingConsent });
    const oversized = await postRaw(request, path, JSON.stringify({ ...body, consentNote: oversizedText() }));
    await expectApiError(oversized, 413, "PAYLOAD_TOO_LARGE");
    await expectApiError(await postRaw(request, path, "{carerName: 'Kofi'}"), 400, "BAD_REQUEST");

    const today = new TodayPage(cast.client.page);
    await today.open();
    expect(await today.carersSection().textContent()).not.toContain(address);
  });

  it("accepting an invitation", async () => {
    const { request } = (await cast.guestPage()).context();
    const path = `/api/invitations/${encodeURIComponent(invitationIdFrom(cast.invitationLink))}/accept`;
    const missing = await expectApiError(await request.post(path, { data: {} }), 400, "VALIDATION");
    expect(Object.keys(missing.fields ?? {}).sort()).toEqual(["confirmPassword", "name", "password"]);
    const password = "long enough password";
    const body = { name: "Ffion Gale", password, confirmPassword: password };
    const madeUp = await request.post("/api/invitations/made-up-invitation-id-0000000000/accept", { data: body });
    await expectApiError(madeUp, 404, "NOT_FOUND");

    // Both refusals left the real invitation open.
    const page = await cast.guestPage();
    await new AcceptInvitationPage(page).open(cast.invitationLink);
    expect(await new AcceptInvitationPage(page).submitButton().count()).toBe(1);
  });
});
