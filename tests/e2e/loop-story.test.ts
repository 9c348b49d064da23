import sharp from "sharp";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CheckInPage } from "./pages/check-in-page";
import { ProgrammeBuilderPage } from "./pages/programme-builder-page";
import { launchBrowser } from "./support/browser";
import { demo } from "./support/demo-accounts";
import { POLL } from "./support/form-fields";
import { whenInteractive } from "./support/hydration";
import { messagesTo, waitForMessage } from "./support/mailbox";
import { signInAs, type Session } from "./support/people";
import { readyClient } from "./support/ready-client";

// The whole loop as one story, with an invented client: an update, a report with a photo, a flag and an e-mail, a
// reply, a change made from that reply, the client confirming it, and the timeline telling it in order.
let browser: Browser;
let therapist: Session;
let client: Session;
let clientId = "";
let clientEmail = "";
// Unique per run, so the review queue and timeline can be searched by name against a database reused between runs.
const clientName = `Wilhelmina Okoro-${Date.now().toString(36).slice(-5)}`;

async function redness() {
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="480" height="360"><rect width="480" height="360" fill="#d9b89c"/><ellipse cx="240" cy="180" rx="110" ry="80" fill="#d97a6c"/></svg>`;
  return { name: "redness.jpg", mimeType: "image/jpeg", buffer: await sharp(Buffer.from(svg)).jpeg().toBuffer() };
}

async function publishFromBuilder(path: string, field: string, value: string, reason: string) {
  const { page } = therapist;
  await page.goto(path);
  const builder = new ProgrammeBuilderPage(page);
  await whenInteractive(page.getByRole("button", { name: "Publish this version" }));
  await builder.setNumber(1, field, value);
  await builder.publish(reason);
  await expect.poll(() => builder.publishedNotice().textContent(), POLL).toMatch(/Version \d+ published/);
}

beforeAll(async () => {
  browser = await launchBrowser();
  therapist = await signInAs(browser, demo.therapist.email, "/caseload");
  const ready = await readyClient(browser, therapist, clientName);
  clientId = ready.clientId;
  clientEmail = ready.email;
  client = ready.session;
});

afterAll(async () => {
  await client?.context.close();
  await therapist?.context.close();
  await browser?.close();
});

describe("the core loop", () => {
  it("the therapist publishes an update and the client is e-mailed", async () => {
    await publishFromBuilder(`/clients/${clientId}/programme`, "Rest (s)", "30", "More rest between contractions while endurance builds.");
    await expect.poll(async () => (await messagesTo(clientEmail)).filter((m) => m.subject === "There is an update for you in Rampline").length, POLL).toBe(2);
  });

  it("the client reports redness with a photo; the therapist gets the flag and an e-mail", async () => {
    const form = new CheckInPage(client.page);
    await form.open();
    await form.fill({ strength: "20", comfort: 6, skinA: "No change", skinB: "Red for longer", photo: await redness() });
    await form.save();
    await waitForMessage(demo.therapist.email, (m) => m.subject === "A client's report is waiting for your review");
    await therapist.page.goto("/review");
    const flag = therapist.page.getByRole("listitem").filter({ hasText: `${clientName}: Skin` });
    await expect.poll(() => flag.count(), POLL).toBe(1);
    expect(await flag.getByRole("link", { name: "Open the session log and photos" }).count()).toBe(1);
  });

  it("the therapist replies, and from that reply shortens channel 1's pulses", async () => {
    const { page } = therapist;
    await page.goto(`/clients/${clientId}/messages`);
    const compose = page.getByRole("form", { name: "Write a message" });
    await whenInteractive(compose.getByRole("button", { name: "Send" }));
    await compose.getByLabel("Your message").fill("Thank you for the photo. I will shorten the pulses on channel 1.");
    await compose.getByRole("button", { name: "Send" }).click();
    const mine = page.getByRole("listitem").filter({ hasText: "I will shorten the pulses" });
    await mine.waitFor();
    const propose = await mine.getByRole("link", { name: "Propose a change from this message" }).getAttribute("href");
    expect(propose).toMatch(/\?prompt=message:/);
    await publishFromBuilder(propose!, "Phase duration (µs)", "250", "Redness lasting under electrode B: shorter pulses.");
  });

  it("the client sees the diff in the thread and confirms the stimulator matches", async () => {
    const { page } = client;
    await page.goto("/messages");
    const system = page.getByRole("listitem").filter({ hasText: "published version 3" });
    await expect.poll(() => system.textContent(), POLL).toContain("Pulse duration, channel 1: 300 µs → 250 µs");
    await page.goto("/programme");
    const confirm = page.getByRole("button", { name: "My stimulator now matches version 3" });
    await whenInteractive(confirm);
    await confirm.click();
    await expect.poll(() => page.getByText(/confirmed on .* that the stimulator matches version 3/).count(), POLL).toBe(1);
  });

  it("the timeline shows each step in order", async () => {
    const { page } = therapist;
    await page.goto(`/clients/${clientId}/timeline`);
    const items = page.getByRole("list", { name: "Timeline, newest first" }).getByRole("listitem");
    await items.first().waitFor();
    const texts = await items.allTextContents();
    const find = (pattern: RegExp) => texts.findIndex((text) => pattern.test(text));
    // Newest first: confirmation, version 3, the reply, the flag, the report, version 2, version 1.
    const order = [/confirmed the stimulator matches version 3/, /Version 3 published.*in reply to a message/, /Message from Priya/, /Flag: Skin/, new RegExp(`Session logged by ${clientName}`), /Version 2 published/, /Version 1 published/].map(find);
    expect(order.every((index) => index >= 0)).toBe(true);
    expect([...order].sort((a, b) => a - b)).toEqual(order);
  });
});
