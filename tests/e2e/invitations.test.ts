import type { Browser, BrowserContext, Page } from "playwright-core";
import { whenInteractive } from "./support/hydration";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { demoClinic } from "@/db/seed/demo-clinic";
import { AcceptInvitationPage } from "./pages/accept-invitation-page";
import { AppHeader } from "./pages/app-header";
import { CaseloadPage } from "./pages/caseload-page";
import { ClientPage } from "./pages/client-page";
import { TeamPage } from "./pages/team-page";
import { TodayPage } from "./pages/today-page";
import { launchBrowser, newContext } from "./support/browser";
import { demo } from "./support/demo-accounts";
import { expectFieldError, expectFieldValid, POLL } from "./support/form-fields";
import { messagesTo } from "./support/mailbox";
import { NEW_PERSON_PASSWORD, signInAndWaitForHome, signInAs, uniqueEmail, waitForInvitationLink } from "./support/people";

// Invented people, new addresses every run, so the journey can be repeated against the same database.
const therapist = { invitedAs: "Nadia Quarrie", name: "Nadia Quarrie-Bell", email: uniqueEmail("invited-therapist") };
const client = { name: "Tomasz Hollin", email: uniqueEmail("invited-client") };
const carer = { name: "Elin Hollin", email: uniqueEmail("invited-carer"), relationship: "Wife" };
const joinHeading = `Join ${demoClinic.name} on Rampline`;

let browser: Browser;
const contexts: BrowserContext[] = [];
let adminPage: Page;
let therapistPage: Page;

async function freshPage() {
  const context = await newContext(browser);
  contexts.push(context);
  return context.newPage();
}

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  for (const context of contexts) await context.close();
  await browser?.close();
});

// One story told in order: each step starts from where the previous one left the people and their mail.
describe("joining a clinic by invitation", () => {
  let therapistLink: string;

  it("lets the clinic admin invite a therapist from the Team page", async () => {
    const admin = await signInAs(browser, demo.admin.email, "/team");
    contexts.push(admin.context);
    adminPage = admin.page;
    const team = new TeamPage(adminPage);
    await team.invite(therapist.invitedAs, therapist.email);
    await expect.poll(() => team.sentNotice().textContent(), POLL).toContain(therapist.email);
    await expect.poll(() => team.waitingInvitations().textContent(), POLL).toContain(therapist.email);

    therapistLink = await waitForInvitationLink(therapist.email);
    expect(therapistLink.startsWith(`${new URL(adminPage.url()).origin}/invitations/`)).toBe(true);
  });

  it("shows the therapist the clinic and their address, and checks the password before accepting", async () => {
    therapistPage = await freshPage();
    const invitation = new AcceptInvitationPage(therapistPage);
    await invitation.open(therapistLink);
    expect(await invitation.heading().textContent()).toBe(joinHeading);
    const invitedLine = (await invitation.invitedLine().textContent()) ?? "";
    expect(invitedLine).toContain(therapist.email);
    expect(invitedLine).toContain("as therapist");
    // The admin's spelling of the name is offered, and the therapist may correct it.
    await whenInteractive(invitation.nameField());
    expect(await invitation.nameField().inputValue()).toBe(therapist.invitedAs);

    await invitation.accept(therapist.name, "short one", "short one");
    await expectFieldError(invitation.passwordField(), "Use at least 10 characters.");
    await invitation.accept(therapist.name, NEW_PERSON_PASSWORD, `${NEW_PERSON_PASSWORD}.`);
    await expectFieldValid(invitation.passwordField());
    await expectFieldError(invitation.repeatField(), "The two passwords are not the same.");

    await invitation.acceptAndWaitForHome(therapist.name, NEW_PERSON_PASSWORD, "/caseload");
    const caseload = new CaseloadPage(therapistPage);
    expect(await caseload.heading().textContent()).toBe("Caseload");
    await caseload.emptyState().waitFor();
    expect(await new AppHeader(therapistPage).banner().textContent()).toContain(therapist.name);
  });

  it("lets the new therapist sign out and back in with the chosen password", async () => {
    await new AppHeader(therapistPage).signOut();
    await therapistPage.goto("/caseload");
    expect(new URL(therapistPage.url()).pathname).toBe("/sign-in");
    await signInAndWaitForHome(therapistPage, therapist.email, NEW_PERSON_PASSWORD, "/caseload");
  });

  it("sent the therapist exactly one e-mail", async () => {
    const messages = await messagesTo(therapist.email);
    expect(messages.map((message) => message.subject)).toEqual([`You're invited to Rampline by ${demoClinic.name}`]);
  });

  it("lists the therapist on the admin's Team page and no longer as waiting", async () => {
    const team = new TeamPage(adminPage);
    await team.open();
    const row = (await team.staffRow(therapist.email).textContent()) ?? "";
    expect(row).toContain(therapist.name);
    expect(row).toContain("Therapist");
    expect(row).toContain("Active");
    expect(await team.waitingInvitations().textContent()).not.toContain(therapist.email);
  });

  it("says that a used invitation has been used, without offering the form again", async () => {
    const page = await freshPage();
    const invitation = new AcceptInvitationPage(page);
    await invitation.open(therapistLink);
    expect(await invitation.problem().textContent()).toContain("This invitation has already been used.");
    expect(await invitation.submitButton().count()).toBe(0);
  });

  it("answers a made-up invitation with the not-found page and a 404", async () => {
    const page = await freshPage();
    const response = await new AcceptInvitationPage(page).open("/invitations/made-up-invitation-id-0000000000");
    expect(response?.status()).toBe(404);
    expect(await page.getByRole("heading", { level: 1 }).first().textContent()).toBe("Page not found");
  });

  let clientLink: string;

  it("lets the new therapist invite a client from the caseload", async () => {
    const caseload = new CaseloadPage(therapistPage);
    await caseload.open();
    await caseload.invite(client.name, client.email);
    await expect.poll(() => caseload.sentNotice().textContent(), POLL).toContain(client.email);
    await expect.poll(() => caseload.clientRow(client.email).textContent(), POLL).toMatch(/invitation sent/i);
    expect(await caseload.emptyState().count()).toBe(0);
    clientLink = await waitForInvitationLink(client.email);
  });

  let clientPage: Page;

  it("brings the client to an empty Today page once they accept", async () => {
    clientPage = await freshPage();
    const invitation = new AcceptInvitationPage(clientPage);
    await invitation.open(clientLink);
    expect(await invitation.heading().textContent()).toBe(joinHeading);
    expect(await invitation.invitedLine().textContent()).toContain(`${therapist.name} invited ${client.email} as client`);
    await invitation.acceptAndWaitForHome(client.name, NEW_PERSON_PASSWORD, "/today");

    const today = new TodayPage(clientPage);
    expect(await today.heading().textContent()).toBe("Hello, Tomasz");
    await today.emptyState().waitFor();
    expect(await today.carersSection().textContent()).toContain("No carers are linked to you yet.");
  });

  it("asks the client to tick the consent box before inviting a carer", async () => {
    const today = new TodayPage(clientPage);
    await today.carerForm.fill(carer);
    await today.carerForm.submit();
    await expectFieldError(today.carerForm.consentBox(), "Tick the box to confirm consent to this carer.");
    expect(await today.carerForm.sentNotice().count()).toBe(0);

    await today.carerForm.consentBox().check();
    await today.carerForm.submit();
    await expect.poll(() => today.carerForm.sentNotice().textContent(), POLL).toContain(carer.email);
    const entry = today.carerForm.carerEntry(carer.email);
    await expect.poll(() => entry.textContent(), POLL).toContain(`${carer.name} · ${carer.relationship}`);
    expect(await entry.textContent()).toContain("Invitation sent");
  });

  it("brings the carer to Today, saying whom they help", async () => {
    const link = await waitForInvitationLink(carer.email);
    const page = await freshPage();
    const invitation = new AcceptInvitationPage(page);
    await invitation.open(link);
    expect(await invitation.invitedLine().textContent()).toContain(`${client.name} invited ${carer.email} as carer`);
    await invitation.acceptAndWaitForHome(carer.name, NEW_PERSON_PASSWORD, "/today");

    const today = new TodayPage(page);
    expect(await today.heading().textContent()).toBe("Hello, Elin");
    expect(await today.helpingLine().textContent()).toBe(`You are helping ${client.name}.`);
    await today.emptyState().waitFor();
  });

  it("shows the therapist the carer, their account and the consent on the client's page", async () => {
    const caseload = new CaseloadPage(therapistPage);
    await caseload.open();
    expect(await caseload.clientRow(client.email).textContent()).toMatch(/account active/i);
    const clientRecord = new ClientPage(therapistPage);
    await clientRecord.open(await caseload.clientPagePath(client.name));
    expect(await clientRecord.heading().textContent()).toBe(client.name);
    const entry = (await clientRecord.carerEntry(carer.email).textContent()) ?? "";
    expect(entry).toContain(`${carer.name} · ${carer.relationship}`);
    expect(entry).toContain("Account active");
    expect(entry).toContain("consent agreed in Rampline");
  });
});
