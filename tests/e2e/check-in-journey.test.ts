import AxeBuilder from "@axe-core/playwright";
import sharp from "sharp";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CheckInPage } from "./pages/check-in-page";
import { launchBrowser, newContext } from "./support/browser";
import { demo } from "./support/demo-accounts";
import { POLL } from "./support/form-fields";
import { whenInteractive } from "./support/hydration";
import { waitForMessage } from "./support/mailbox";
import { signInAndWaitForHome, type Session } from "./support/people";

// The client's half at a phone's size: the demo client Arthur (one channel) logs sessions, his carer Grace logs one
// for him, and his therapist Priya sees what they sent.
const PHONE = { width: 390, height: 844 };
const arthurRecord = "/clients/demo-client-arthur";
let browser: Browser;

// A drawn stand-in for a photo of redness: never a picture of real skin.
async function rednessImage() {
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="480" height="360"><rect width="480" height="360" fill="#d9b89c"/><ellipse cx="240" cy="180" rx="110" ry="80" fill="#d97a6c"/></svg>`;
  return { name: "redness.jpg", mimeType: "image/jpeg", buffer: await sharp(Buffer.from(svg)).jpeg().toBuffer() };
}

async function openAs(email: string, home: string, viewport = PHONE): Promise<Session> {
  const context = await newContext(browser, { viewport });
  const page = await context.newPage();
  await signInAndWaitForHome(page, email, demo.password, home);
  return { context, page };
}

async function expectNoAxeViolations(page: Page) {
  const { violations } = await new AxeBuilder({ page }).analyze();
  expect(violations.map((v) => `${v.id}: ${v.help} at ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`)).toEqual([]);
}

let client: Session;
let therapist: Session;

beforeAll(async () => {
  browser = await launchBrowser();
  client = await openAs(demo.client.email, "/today");
  therapist = await openAs(demo.therapist.email, "/caseload", { width: 1280, height: 900 });
});

afterAll(async () => {
  await client?.context.close();
  await therapist?.context.close();
  await browser?.close();
});

describe("logging sessions and what the therapist sees", () => {
  it("shows today's sessions and passes axe on the client's pages", async () => {
    const { page } = client;
    expect(await page.locator("main").textContent()).toMatch(/of 1 done/);
    await expectNoAxeViolations(page);
    for (const path of ["/programme", "/history"]) {
      await page.goto(path);
      await page.getByRole("heading", { level: 1 }).waitFor();
      await expectNoAxeViolations(page);
    }
  });

  it("runs a guided session from Today on a fake clock, then logs it with lasting redness and a photo; the therapist sees the flag, the photo and the settings in force", async () => {
    // A page of its own with Playwright's clock installed first, so the 30-minute timer runs in an instant.
    await client.context.clock.install({ time: new Date() });
    const page = await client.context.newPage();
    await page.goto("/today");
    await page.getByRole("link", { name: "Start a guided session" }).click();
    await page.waitForURL((url) => url.pathname === "/session");
    const start = page.getByRole("button", { name: "Start the session timer" });
    await whenInteractive(start);
    for (const box of await page.getByRole("group", { name: "Tick each one when it is done" }).getByRole("checkbox").all()) await box.check();
    await start.click();
    await page.getByRole("button", { name: "My stimulator is running: start the timer" }).click();
    await page.clock.fastForward("30:00");
    const log = page.getByRole("link", { name: "Log this session" });
    await log.waitFor();
    expect(await log.getAttribute("href")).toBe("/check-in?minutes=30");
    await log.click();
    await page.waitForURL((url) => url.pathname === "/check-in");
    await page.clock.resume();
    const form = new CheckInPage(page);
    await whenInteractive(page.getByRole("button", { name: "Save this session" }));
    expect(await page.getByLabel("Minutes done").inputValue()).toBe("30");
    await expectNoAxeViolations(page);
    await form.fill({ strength: "22", comfort: 6, skinA: "No change", skinB: "Red for longer", photo: await rednessImage() });
    await form.save();
    expect(await form.stopAlert().count()).toBe(0);
    await page.close();

    const staff = therapist.page;
    await staff.goto(arthurRecord);
    const flag = staff.getByText(/Skin: red for longer, or still there next time under channel 1, electrode B/).first();
    await flag.waitFor();
    await staff.getByRole("link", { name: "Open the check-in" }).first().click();
    await staff.getByRole("heading", { level: 1, name: /^Session of/ }).waitFor();
    expect(await staff.getByRole("img", { name: "Skin under channel 1, electrode B, photo 1" }).count()).toBe(1);
    const settings = await staff.getByRole("table", { name: /^Channel 1:/ }).textContent();
    expect(settings).toContain("Pulse duration300 µs");
    expect(await staff.locator("main").textContent()).toContain("ICDRG reading: + weak");
  });

  it("shows the stop message at once for blisters, and puts an urgent flag and an e-mail in front of the therapist", async () => {
    const form = new CheckInPage(client.page);
    await form.open();
    await form.fill({ strength: "20", comfort: 4, skinA: "No change", skinB: "Blisters, broken skin or a burn mark" });
    await client.page.getByRole("button", { name: "Save this session" }).click();
    await expect.poll(() => form.stopAlert().textContent(), POLL).toContain("Stop using the stimulator on that site now, and contact your clinic");
    await expectNoAxeViolations(client.page);

    const mail = await waitForMessage(demo.therapist.email, (m) => m.subject === "Urgent: a client's report needs you today");
    for (const word of ["blister", "Arthur", "skin"]) expect(mail.html).not.toContain(word);
    await therapist.page.goto(arthurRecord);
    await expect.poll(() => therapist.page.getByText(/^Urgent$/).count(), POLL).toBeGreaterThan(0);
  });

  it("records a carer's log as the carer's, in the record and in the therapist's view", async () => {
    const carer = await openAs(demo.carer.email, "/today");
    const form = new CheckInPage(carer.page);
    await form.open();
    expect(await carer.page.locator("main").textContent()).toContain("recorded as your entry");
    await form.fill({ strength: "15", comfort: 8, skinA: "No change", skinB: "No change" });
    await form.save();
    await carer.context.close();

    await therapist.page.goto(arthurRecord);
    const table = therapist.page.getByRole("table", { name: "Latest sessions" });
    await expect.poll(() => table.textContent(), POLL).toContain(`${demo.carer.name} (carer)`);
  });
});
