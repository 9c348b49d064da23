import type { Browser, BrowserContext } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AppHeader } from "./pages/app-header";
import { ForgotPasswordPage } from "./pages/forgot-password-page";
import { MailboxMessagePage } from "./pages/mailbox-message-page";
import { ResetPasswordPage } from "./pages/reset-password-page";
import { SignInPage } from "./pages/sign-in-page";
import { launchBrowser, newContext } from "./support/browser";
import { demo } from "./support/demo-accounts";
import { whenInteractive } from "./support/hydration";
import { expectFieldError, expectFieldValid, POLL, recordApiCalls } from "./support/form-fields";
import { waitForMessage, type FakeMessage } from "./support/mailbox";
import {
  acceptInvitationInNewContext,
  inviteTherapistAs,
  linkIn,
  NEW_PERSON_PASSWORD,
  signInAndWaitForHome,
  signInAs,
  signInOnPage,
  uniqueEmail,
} from "./support/people";

// The journey runs on a therapist the test invites itself, so the demo sign-ins other files use never change.
const therapist = { name: "Rhiannon Tallis", email: uniqueEmail("reset-therapist") };
const newPassword = "lanterns along the quay at dusk";

let browser: Browser;
const contexts: BrowserContext[] = [];
let sessionBeforeReset: BrowserContext;

async function freshContext() {
  const context = await newContext(browser);
  contexts.push(context);
  return context;
}

beforeAll(async () => {
  browser = await launchBrowser();
  const admin = await signInAs(browser, demo.admin.email, "/team");
  contexts.push(admin.context);
  const link = await inviteTherapistAs(admin.context, therapist);
  // Accepting signs the therapist in: this session must not survive the reset.
  sessionBeforeReset = await acceptInvitationInNewContext(browser, link, therapist.name, NEW_PERSON_PASSWORD);
  contexts.push(sessionBeforeReset);
});

afterAll(async () => {
  for (const context of contexts) await context.close();
  await browser?.close();
});

describe("resetting a forgotten password", () => {
  let resetMessage: FakeMessage;
  let resetLink: string;
  let confirmationForKnownAddress: string;

  it("sends a link from the sign-in page's 'Forgotten your password?'", async () => {
    const page = await (await freshContext()).newPage();
    await new SignInPage(page).open();
    await (await whenInteractive(page.getByRole("link", { name: "Forgotten your password?" }))).click();
    await page.waitForURL((url) => url.pathname === "/forgot-password");
    const forgot = new ForgotPasswordPage(page);
    expect(await forgot.heading().textContent()).toBe("Forgotten your password?");

    await forgot.askForLink(therapist.email);
    await expect.poll(() => forgot.confirmation().textContent(), POLL).toContain(therapist.email);
    confirmationForKnownAddress = (await forgot.confirmation().textContent()) ?? "";

    resetMessage = await waitForMessage(therapist.email, (message) => message.subject === "Reset your Rampline password");
    resetLink = linkIn(resetMessage, "/reset-password");
    expect(new URL(resetLink).searchParams.get("token")).toMatch(/\w{10,}/);
  });

  it("follows the link from the mailbox and explains a short or mismatched password before saving", async () => {
    const page = await (await freshContext()).newPage();
    const mailbox = new MailboxMessagePage(page);
    await mailbox.open(resetMessage.id);
    expect(await mailbox.heading().textContent()).toBe("Reset your Rampline password");
    await mailbox.follow(resetLink);
    await page.waitForURL((url) => url.pathname === "/reset-password");

    const reset = new ResetPasswordPage(page);
    const calls = recordApiCalls(page);
    await reset.choose("too short", "too short");
    await expectFieldError(reset.newPasswordField(), "Use at least 10 characters.");

    await reset.choose(newPassword, `${newPassword}!`);
    await expectFieldValid(reset.newPasswordField());
    await expectFieldError(reset.repeatField(), "The two passwords are not the same.");
    // Both mistakes were caught in the browser: nothing reached the server, so the one-use token is still good.
    expect(calls).toEqual([]);

    await reset.choose(newPassword);
    await page.waitForURL((url) => url.pathname === "/sign-in");
    const notice = page.getByRole("status").filter({ hasText: "Password changed" });
    await expect.poll(() => notice.textContent(), POLL).toContain("Sign in with your new password.");

    await signInAndWaitForHome(page, therapist.email, newPassword, "/caseload");
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("Caseload");
    expect(await new AppHeader(page).banner().textContent()).toContain(therapist.name);
  });

  it("ends the sessions that were open before the reset", async () => {
    const page = await sessionBeforeReset.newPage();
    await page.goto("/caseload");
    expect(new URL(page.url()).pathname).toBe("/sign-in");
  });

  it("no longer accepts the old password", async () => {
    const page = await (await freshContext()).newPage();
    await signInOnPage(page, therapist.email, NEW_PERSON_PASSWORD);
    await expect.poll(() => new SignInPage(page).alert().textContent(), POLL).toContain("do not match");
    expect(new URL(page.url()).pathname).toBe("/sign-in");
  });

  it("does not let the same link change the password twice", async () => {
    const page = await (await freshContext()).newPage();
    await page.goto(resetLink);
    const reset = new ResetPasswordPage(page);
    await reset.choose("a third password nobody chose");
    await expect.poll(() => reset.alert().textContent(), POLL).toContain("This link has expired or has already been used.");

    // The refused attempt changed nothing: the password saved through the link still works.
    await signInAndWaitForHome(page, therapist.email, newPassword, "/caseload");
  });

  it("answers an address without an account exactly as it answers one with an account", async () => {
    const unknown = uniqueEmail("nobody");
    const page = await (await freshContext()).newPage();
    const forgot = new ForgotPasswordPage(page);
    await forgot.open();
    await forgot.askForLink(unknown);
    await expect.poll(() => forgot.confirmation().textContent(), POLL).toContain(unknown);
    const answer = (await forgot.confirmation().textContent()) ?? "";
    expect(answer.replace(unknown, therapist.email)).toBe(confirmationForKnownAddress);
  });
});
