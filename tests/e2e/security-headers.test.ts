import type { Browser, BrowserContext } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AcceptInvitationPage } from "./pages/accept-invitation-page";
import { CaseloadPage } from "./pages/caseload-page";
import { TodayPage } from "./pages/today-page";
import { launchBrowser, newContext } from "./support/browser";
import { demo } from "./support/demo-accounts";
import { expectFieldError } from "./support/form-fields";
import { whenInteractive } from "./support/hydration";
import { accessibilityProblems, scriptNonce } from "./support/page-security";
import { expectProtectiveHeaders, isZodEvalProbe, openScreen } from "./support/screen-checks";
import { inviteTherapistAs, NEW_PERSON_PASSWORD, signInAs, uniqueEmail } from "./support/people";

type Who = "guest" | "admin" | "therapist" | "client" | "carer";

let browser: Browser;
const sessions = new Map<Who, BrowserContext>();
let invitationPath = "";
let spareInvitationLink = "";
let clientPath = "";

// Every screen that exists so far, each opened by the person it is for. Paths found at run time are read lazily.
const screens: { name: string; who: Who; path: () => string; status?: number }[] = [
  { name: "landing page", who: "guest", path: () => "/" },
  { name: "sign-in", who: "guest", path: () => "/sign-in" },
  { name: "forgotten password", who: "guest", path: () => "/forgot-password" },
  { name: "choose a new password", who: "guest", path: () => "/reset-password?token=made-up-token" },
  { name: "invitation", who: "guest", path: () => invitationPath },
  { name: "page not found", who: "guest", path: () => "/invitations/made-up-invitation-id-0000000000", status: 404 },
  { name: "team", who: "admin", path: () => "/team" },
  { name: "caseload", who: "therapist", path: () => "/caseload" },
  { name: "client record", who: "therapist", path: () => clientPath },
  { name: "not available to your role", who: "therapist", path: () => "/team", status: 403 },
  { name: "today, for a client", who: "client", path: () => "/today" },
  { name: "today, for a carer", who: "carer", path: () => "/today" },
];

function session(who: Who): BrowserContext {
  const context = sessions.get(who);
  if (!context) throw new Error(`No ${who} session`);
  return context;
}

beforeAll(async () => {
  browser = await launchBrowser();
  sessions.set("guest", await newContext(browser));
  const people = [
    ["admin", demo.admin, "/team"],
    ["therapist", demo.therapist, "/caseload"],
    ["client", demo.client, "/today"],
    ["carer", demo.carer, "/today"],
  ] as const;
  // The demo people are only looked at here, never changed, so other files can rely on them.
  for (const [who, person, home] of people) sessions.set(who, (await signInAs(browser, person.email, home)).context);
  const link = await inviteTherapistAs(session("admin"), { name: "Bryn Ashdown", email: uniqueEmail("headers-invitee") });
  invitationPath = new URL(link).pathname;
  spareInvitationLink = await inviteTherapistAs(session("admin"), { name: "Cerys Ashdown", email: uniqueEmail("headers-cookie") });
  const caseloadPage = await session("therapist").newPage();
  await new CaseloadPage(caseloadPage).open();
  clientPath = await new CaseloadPage(caseloadPage).clientPagePath(demo.client.name);
  await caseloadPage.close();
});

afterAll(async () => {
  for (const context of sessions.values()) await context.close();
  await browser?.close();
});

async function expectHeaders(who: Who, path: string, status?: number) {
  const screen = await openScreen(session(who), path);
  await expectProtectiveHeaders(screen, path, status);
  await screen.page.close();
}

// A violation fails the test; the one known, reported app gap is shown as skipped with its reason instead.
async function expectNoCspViolation(who: Who, path: string, skip: (note: string) => void) {
  const { page, violations } = await openScreen(session(who), path);
  const found = await violations();
  await page.close();
  if (found.length > 0 && found.every(isZodEvalProbe)) skip("zod's eval probe is refused until the app sets z.config({ jitless: true })");
  expect(found).toEqual([]);
}

async function expectAccessible(who: Who, path: string) {
  const { page } = await openScreen(session(who), path);
  expect(await accessibilityProblems(page)).toEqual([]);
  await page.close();
}

describe.each(screens)("$name", (screen) => {
  it("sends a nonce-based CSP, nosniff and DENY, with the nonce on every script", async () => {
    await expectHeaders(screen.who, screen.path(), screen.status);
  });

  it("runs without a CSP violation", async ({ skip }) => {
    await expectNoCspViolation(screen.who, screen.path(), skip);
  });

  it("has no accessibility problems that axe can find", async () => {
    await expectAccessible(screen.who, screen.path());
  });
});

describe("the content security policy", () => {
  it("uses a new nonce for every response", async () => {
    const first = await session("guest").request.get("/sign-in");
    const second = await session("guest").request.get("/sign-in");
    const nonces = [first, second].map((response) => scriptNonce(response.headers()["content-security-policy"] ?? ""));
    expect(nonces[0]).toBeTruthy();
    expect(nonces[1]).not.toBe(nonces[0]);
  });

  // Shows the watch above can fail: an inline handler has no nonce, so the policy must refuse it and say so.
  it("refuses inline script that lacks the nonce, and the watch notices", async () => {
    const { page, violations } = await openScreen(session("guest"), "/");
    const outcome = await page.evaluate(() => {
      const button = document.createElement("button");
      button.setAttribute("onclick", "document.body.dataset.injected = 'ran'");
      document.body.append(button);
      button.click();
      return document.body.dataset.injected ?? "refused";
    });
    expect(outcome).toBe("refused");
    await expect.poll(violations).toContainEqual(expect.stringContaining("script-src-attr blocked inline"));
    await page.close();
  });

  // The settings explorer is public and also in the staff menu; while it is being built a 404 is shown as skipped.
  it.for(["guest", "therapist"] as const)("covers the settings explorer for the %s", async (who, { skip }) => {
    const probe = await session(who).request.get("/explore");
    if (probe.status() === 404) skip("/explore is not built yet");
    await expectHeaders(who, "/explore");
    await expectAccessible(who, "/explore");
    // Last, because the known gap reports this test as skipped.
    await expectNoCspViolation(who, "/explore", skip);
  });
});

describe("the session cookie", () => {
  async function sessionCookies(context: BrowserContext) {
    const cookies = (await context.cookies()).filter((cookie) => cookie.name.includes("session"));
    expect(cookies.map((cookie) => cookie.name)).toContain("better-auth.session_token");
    return cookies;
  }

  it.each(["admin", "therapist", "client", "carer"] as const)("is HttpOnly and SameSite=Lax for the %s", async (who) => {
    for (const cookie of await sessionCookies(session(who))) {
      expect(cookie.httpOnly, cookie.name).toBe(true);
      expect(cookie.sameSite, cookie.name).toBe("Lax");
    }
  });

  // Accepting an invitation copies the cookie onto its own response, a separate path from signing in.
  it("is HttpOnly and SameSite=Lax when it comes from accepting an invitation", async () => {
    const context = await newContext(browser);
    const page = await context.newPage();
    await new AcceptInvitationPage(page).open(spareInvitationLink);
    await new AcceptInvitationPage(page).acceptAndWaitForHome("Cerys Ashdown", NEW_PERSON_PASSWORD, "/caseload");
    for (const cookie of await sessionCookies(context)) {
      expect(cookie.httpOnly, cookie.name).toBe(true);
      expect(cookie.sameSite, cookie.name).toBe("Lax");
    }
    await context.close();
  });
});

describe("forms showing their messages", () => {
  it("sign-in has no accessibility problems that axe can find", async () => {
    const { page } = await openScreen(session("guest"), "/sign-in");
    await (await whenInteractive(page.getByRole("button", { name: "Sign in" }))).click();
    await expectFieldError(page.getByLabel("E-mail address"), "Enter an e-mail address.");
    expect(await accessibilityProblems(page)).toEqual([]);
    await page.close();
  });

  it("the client's carer invitation has no accessibility problems that axe can find", async () => {
    const { page } = await openScreen(session("client"), "/today");
    const today = new TodayPage(page);
    await today.carerForm.submit();
    await expectFieldError(today.carerForm.consentBox(), "Tick the box to confirm consent to this carer.");
    expect(await accessibilityProblems(page)).toEqual([]);
    await page.close();
  });
});
