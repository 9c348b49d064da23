import type { Browser, BrowserContext, Page } from "playwright-core";
import { expect } from "vitest";
import { SignInPage } from "../pages/sign-in-page";
import { newContext } from "./browser";
import { demo } from "./demo-accounts";
import { formAround, whenInteractive } from "./hydration";
import { waitForMessage, type FakeMessage } from "./mailbox";

// A password long enough for the app's rules; invented people created by the tests all use it.
export const NEW_PERSON_PASSWORD = "seven slow herons wading";

let sequence = 0;

// Every run invents new addresses, so the files can run in any order and again against the same database.
export function uniqueEmail(label: string): string {
  sequence += 1;
  return `${label}.${Date.now().toString(36)}${process.pid.toString(36)}${sequence}@e2e.larkmoor.example`;
}

export type Session = { context: BrowserContext; page: Page };

// Signs in through the form once it is live; opens /sign-in first unless the page is already there.
export async function signInOnPage(page: Page, email: string, password: string) {
  const signIn = new SignInPage(page);
  if (!page.url().startsWith("http") || new URL(page.url()).pathname !== "/sign-in") await signIn.open();
  await whenInteractive(formAround(page.getByLabel("E-mail address")));
  await signIn.signIn(email, password);
}

export async function signInAndWaitForHome(page: Page, email: string, password: string, home: string) {
  await signInOnPage(page, email, password);
  await page.waitForURL((url) => url.pathname === home);
}

// A fresh context per person, so each sign-in comes from its own client address and its own cookie jar.
export async function signInAs(browser: Browser, email: string, home: string, password = demo.password): Promise<Session> {
  const context = await newContext(browser);
  const page = await context.newPage();
  await signInAndWaitForHome(page, email, password, home);
  return { context, page };
}

export function linkIn(message: FakeMessage, pathPrefix: string): string {
  const link = message.links.find((href) => href.startsWith("http") && new URL(href).pathname.startsWith(pathPrefix));
  if (!link) throw new Error(`The e-mail "${message.subject}" has no link to ${pathPrefix}: ${message.links.join(", ")}`);
  return link;
}

export function invitationIdFrom(link: string): string {
  const id = new URL(link).pathname.split("/").pop();
  if (!id) throw new Error(`No invitation id in ${link}`);
  return id;
}

export async function waitForInvitationLink(email: string): Promise<string> {
  const message = await waitForMessage(email, (candidate) => candidate.subject.startsWith("You're invited to Rampline"));
  return linkIn(message, "/invitations/");
}

// Set-up through the same JSON route the Team page's form uses; journeys that test the form itself use the page.
export async function inviteTherapistAs(admin: BrowserContext, person: { name: string; email: string }): Promise<string> {
  const response = await admin.request.post("/api/team/invitations", { data: person });
  expect(response.status(), await response.text()).toBe(201);
  return waitForInvitationLink(person.email);
}

// Accepting signs the new person in, so the returned context carries their session.
export async function acceptInvitationInNewContext(browser: Browser, link: string, name: string, password = NEW_PERSON_PASSWORD) {
  const context = await newContext(browser);
  const response = await context.request.post(`/api/invitations/${encodeURIComponent(invitationIdFrom(link))}/accept`, {
    data: { name, password, confirmPassword: password },
  });
  expect(response.status(), await response.text()).toBe(201);
  return context;
}
