import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AcceptInvitationPage } from "./pages/accept-invitation-page";
import { CaseloadPage } from "./pages/caseload-page";
import { ClientPage } from "./pages/client-page";
import { ForgotPasswordPage } from "./pages/forgot-password-page";
import { ResetPasswordPage } from "./pages/reset-password-page";
import { SignInPage } from "./pages/sign-in-page";
import { TeamPage } from "./pages/team-page";
import { TodayPage } from "./pages/today-page";
import { newContext } from "./support/browser";
import { demo } from "./support/demo-accounts";
import { expectFieldError, expectFieldValid, POLL, recordApiCalls } from "./support/form-fields";
import { MESSAGES } from "./support/form-messages";
import { whenInteractive } from "./support/hydration";
import { assembleCast, type Cast } from "./support/validation-cast";

// Every form checks its fields in the browser and explains each problem on the field itself, before sending a thing.

let cast: Cast;
beforeAll(async () => {
  cast = await assembleCast();
});
afterAll(async () => {
  await cast?.close();
});

describe("every form explains missing and malformed fields before sending anything", () => {
  it("sign in", async () => {
    const page = await cast.guestPage();
    const signIn = new SignInPage(page);
    await signIn.open();
    const calls = recordApiCalls(page);
    await (await whenInteractive(page.getByRole("button", { name: "Sign in" }))).click();
    await expectFieldError(page.getByLabel("E-mail address"), MESSAGES.missingEmail);
    await expectFieldError(page.getByLabel("Password"), MESSAGES.missingPassword);
    await signIn.signIn("arthur.mensah-at-example.net", "any password at all");
    await expectFieldError(page.getByLabel("E-mail address"), MESSAGES.badEmail);
    await expectFieldValid(page.getByLabel("Password"));
    expect(calls).toEqual([]);
  });

  it("forgotten password", async () => {
    const page = await cast.guestPage();
    const forgot = new ForgotPasswordPage(page);
    await forgot.open();
    const calls = recordApiCalls(page);
    await forgot.askForLink("");
    await expectFieldError(forgot.emailField(), MESSAGES.missingEmail);
    await forgot.askForLink("someone@");
    await expectFieldError(forgot.emailField(), MESSAGES.badEmail);
    expect(calls).toEqual([]);
  });

  it("choose a new password", async () => {
    const page = await cast.guestPage();
    await page.goto("/reset-password?token=made-up-token");
    const reset = new ResetPasswordPage(page);
    const calls = recordApiCalls(page);
    await reset.choose("", "");
    await expectFieldError(reset.newPasswordField(), MESSAGES.shortPassword);
    await reset.choose("nine char", "nine char");
    await expectFieldError(reset.newPasswordField(), MESSAGES.shortPassword);
    await reset.choose("long enough password", "long enough passwort");
    await expectFieldError(reset.repeatField(), MESSAGES.mismatch);
    expect(calls).toEqual([]);
  });

  it("choose a new password, without the token from the e-mail", async () => {
    const page = await cast.guestPage();
    await page.goto("/reset-password");
    await expect.poll(() => page.getByRole("main").textContent(), POLL).toContain("This page needs the link from your e-mail.");
    expect(await new ResetPasswordPage(page).newPasswordField().count()).toBe(0);
  });

  it("accept an invitation", async () => {
    const page = await cast.guestPage();
    const invitation = new AcceptInvitationPage(page);
    await invitation.open(cast.invitationLink);
    const calls = recordApiCalls(page);
    await invitation.accept("", "", "");
    await expectFieldError(invitation.nameField(), MESSAGES.missingName);
    await expectFieldError(invitation.passwordField(), MESSAGES.shortPassword);
    await invitation.accept("Ffion Gale", "long enough password", "long enough passwort");
    await expectFieldValid(invitation.nameField());
    await expectFieldError(invitation.repeatField(), MESSAGES.mismatch);
    expect(calls).toEqual([]);
  });

  it("invite a therapist", async () => {
    const team = new TeamPage(cast.admin.page);
    await team.open();
    const calls = recordApiCalls(cast.admin.page);
    await team.invite("", "");
    await expectFieldError(team.nameField(), MESSAGES.missingName);
    await expectFieldError(team.emailField(), MESSAGES.missingEmail);
    await team.invite("Ffion Gale", "ffion.gale.example");
    await expectFieldValid(team.nameField());
    await expectFieldError(team.emailField(), MESSAGES.badEmail);
    expect(calls).toEqual([]);
  });

  it("invite a client", async () => {
    const caseload = new CaseloadPage(cast.therapist.page);
    await caseload.open();
    const calls = recordApiCalls(cast.therapist.page);
    await caseload.invite("", "");
    await expectFieldError(caseload.nameField(), MESSAGES.missingName);
    await expectFieldError(caseload.emailField(), MESSAGES.missingEmail);
    await caseload.invite("Idris Pennant", "idris@pennant@example.net");
    await expectFieldError(caseload.emailField(), MESSAGES.badEmail);
    expect(calls).toEqual([]);
  });

  it("invite a carer, as the client", async () => {
    const today = new TodayPage(cast.client.page);
    await today.open();
    const form = today.carerForm;
    const calls = recordApiCalls(cast.client.page);
    await form.submit();
    await expectFieldError(form.nameField(), MESSAGES.missingName);
    await expectFieldError(form.emailField(), MESSAGES.missingEmail);
    await expectFieldError(form.relationshipField(), MESSAGES.missingRelationship);
    await expectFieldError(form.consentBox(), MESSAGES.missingConsent);
    await form.fill({ name: "Kofi Mensah", email: "kofi.mensah", relationship: "Son" });
    await form.consentBox().check();
    await form.submit();
    await expectFieldError(form.emailField(), MESSAGES.badEmail);
    await expectFieldValid(form.consentBox());
    expect(calls).toEqual([]);
  });

  it("invite a carer, as the therapist", async () => {
    const record = new ClientPage(cast.therapist.page);
    await record.open(cast.arthurPath);
    const form = record.carerForm;
    const calls = recordApiCalls(cast.therapist.page);
    // A therapist records how the client agreed; the first choice is already made for them.
    await expect.poll(() => form.verbalConsent().isChecked(), POLL).toBe(true);
    await form.submit();
    await expectFieldError(form.nameField(), MESSAGES.missingName);
    await expectFieldError(form.emailField(), MESSAGES.missingEmail);
    await expectFieldError(form.relationshipField(), MESSAGES.missingRelationship);
    await expectFieldError(form.consentBox(), MESSAGES.missingConsent);
    await form.fill({ name: "Kofi Mensah", email: "kofi mensah@example.net", relationship: "Son" });
    await form.submit();
    await expectFieldError(form.emailField(), MESSAGES.badEmail);
    expect(calls).toEqual([]);
  });
});

describe("a form sent before its scripts have run", () => {
  // Skipped: the forms carry no method, so without JavaScript (or before React has hydrated them) the browser sends
  // them as a GET and the password lands in the address bar, the history and the server's logs. Unskip once the
  // forms post (or cannot be sent until they are live).
  it.skip("keeps the password out of the address", async () => {
    const context = cast.track(await newContext(cast.browser, { javaScriptEnabled: false }));
    const page = await context.newPage();
    const signIn = new SignInPage(page);
    await signIn.open();
    await signIn.signIn(demo.therapist.email, "words nobody should see");
    await page.waitForLoadState("load");
    expect(page.url()).not.toContain("nobody");
  });
});
