import sharp from "sharp";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CaseloadPage } from "./pages/caseload-page";
import { ProgrammeBuilderPage } from "./pages/programme-builder-page";
import { ScreeningFormPage } from "./pages/screening-form-page";
import { launchBrowser, newContext } from "./support/browser";
import { APP_URL } from "./support/env";
import { demo } from "./support/demo-accounts";
import { POLL } from "./support/form-fields";
import { whenInteractive } from "./support/hydration";
import { waitForMessage } from "./support/mailbox";
import { NEW_PERSON_PASSWORD, signInAs, uniqueEmail, waitForInvitationLink, type Session } from "./support/people";

// The therapist's half of the loop, start to finish, with an invented client.
const client = { name: "Tobias Ferrante", email: uniqueEmail("programme-client") };
let browser: Browser;
let therapist: Session;
let clientSession: Session;
let clientPath = "";

function isoDaysAhead(days: number): string {
  const date = new Date();
  date.setDate(date.getDate() + days);
  return date.toISOString().slice(0, 10);
}

// A generated stand-in for a placement photo: never a picture of a real person.
async function placementImage() {
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="640" height="400"><rect width="640" height="400" fill="#d8cbb8"/><rect x="180" y="160" width="90" height="70" rx="30" fill="#fff"/><rect x="360" y="160" width="90" height="70" rx="30" fill="#fff"/></svg>`;
  return { name: "placement.jpg", mimeType: "image/jpeg", buffer: await sharp(Buffer.from(svg)).jpeg().toBuffer() };
}

beforeAll(async () => {
  browser = await launchBrowser();
  therapist = await signInAs(browser, demo.therapist.email, "/caseload");
});

afterAll(async () => {
  await clientSession?.context.close();
  await therapist?.context.close();
  await browser?.close();
});

describe("a therapist writes, publishes and changes a programme, and the client follows", () => {
  it("invites a client, who accepts", async () => {
    const caseload = new CaseloadPage(therapist.page);
    await caseload.invite(client.name, client.email);
    await caseload.clientRow(client.email).waitFor();
    clientPath = (await caseload.clientRow(client.email).getByRole("link", { name: client.name, exact: true }).getAttribute("href"))!;
    const link = await waitForInvitationLink(client.email);
    const context = await newContext(browser);
    const page = await context.newPage();
    await page.goto(link);
    await whenInteractive(page.getByRole("button", { name: "Accept and continue" }));
    await page.getByLabel("Choose a password", { exact: true }).fill(NEW_PERSON_PASSWORD);
    await page.getByLabel("Type it again", { exact: true }).fill(NEW_PERSON_PASSWORD);
    await page.getByRole("button", { name: "Accept and continue" }).click();
    await page.waitForURL((url) => url.pathname === "/today");
    clientSession = { context, page };
  });

  it("records consent to treatment and a clean screening", async () => {
    const { page } = therapist;
    await page.goto(clientPath);
    const record = page.getByRole("button", { name: "Record consent" });
    await whenInteractive(record);
    await record.click();
    await expect.poll(() => page.getByText(/Given in person or by phone/).count(), POLL).toBe(1);

    await page.getByRole("link", { name: "Start screening" }).click();
    const form = new ScreeningFormPage(page);
    await whenInteractive(form.signButton());
    await form.fillClean({ rescreenOn: isoDaysAhead(90) });
    await form.signButton().click();
    await page.waitForURL((url) => url.pathname === `${clientPath}/screening`);
    await expect.poll(() => page.getByText("Screening complete", { exact: true }).count(), POLL).toBe(1);
  });

  it("builds a two-channel programme with marks and a photo, sees the live findings, and publishes", async () => {
    const { page } = therapist;
    await page.goto(`${clientPath}/programme`);
    const builder = new ProgrammeBuilderPage(page);
    await builder.startFromTemplate("Grasp and release (two channels)");
    expect(await builder.channel(1).getByRole("heading", { level: 2 }).textContent()).toContain("Wrist and finger flexors");
    expect(await builder.channel(2).getByRole("heading", { level: 2 }).textContent()).toContain("Wrist and finger extensors");

    // Until both electrodes are placed, the placement check blocks publishing.
    await expect.poll(() => builder.stillToSortOut().textContent(), POLL).toMatch(/Channel 1/);
    for (const number of [1, 2]) await builder.chooseSide(number, "Right");
    await builder.placeElectrode(1, "A", "Right forearm, palm side (wrist and finger flexors)");
    await builder.placeElectrode(1, "B", "Right wrist, palm side");
    await builder.placeElectrode(2, "A", "Right forearm, back of the arm (wrist and finger extensors)");
    await builder.placeElectrode(2, "B", "Right wrist, back");
    await builder.addPhoto(1, await placementImage());
    await expect.poll(() => builder.photos(1).count(), POLL).toBe(1);

    // The live picture: a frequency band note for 35 Hz, and a block as soon as the pulses cannot fit the period.
    const report = builder.channel(1).getByLabel("What channel 1's settings give");
    await expect.poll(() => report.textContent(), POLL).toContain("Frequency");
    await builder.setNumber(1, "Frequency (Hz)", "5000");
    await expect.poll(() => report.textContent(), POLL).toContain("Pulses overlap");
    await expect.poll(() => builder.stillToSortOut().textContent(), POLL).toContain("Channel 1: Pulses overlap");
    await builder.setNumber(1, "Frequency (Hz)", "35");
    await expect.poll(() => builder.stillToSortOut().count(), POLL).toBe(0);

    await expect.poll(() => builder.saveStatus().textContent(), POLL).toMatch(/Draft saved/);
    await builder.publish("First programme after screening and the in-clinic test.");
    await expect.poll(() => builder.publishedNotice().textContent(), POLL).toContain("Version 1 published");
  });

  it("e-mails the client, without clinical detail, and the client sees the programme and the handout", async () => {
    const message = await waitForMessage(client.email, (m) => m.subject === "There is an update for you in Rampline");
    for (const word of ["Hz", "µs", "electrode", "forearm"]) expect(message.html).not.toContain(word);

    const { page } = clientSession;
    await page.goto("/programme");
    await page.getByRole("heading", { level: 1, name: "Your programme" }).waitFor();
    const main = page.locator("main");
    expect(await main.textContent()).toContain("Channel 1: Wrist and finger flexors (right side)");
    expect(await main.textContent()).toContain("300 µs");
    expect(await page.getByRole("img", { name: "Channel 1, placement photo 1" }).count()).toBe(1);

    await page.getByRole("link", { name: "Open the printable handout" }).click();
    await page.waitForURL((url) => url.pathname === "/programme/handout");
    expect(await page.locator("article").textContent()).toContain("follows the advice of your treating clinician");
    const pdfHref = await page.getByRole("link", { name: "Download as PDF" }).getAttribute("href");
    const pdf = await clientSession.context.request.get(`${APP_URL}${pdfHref}`);
    expect(pdf.status()).toBe(200);
    expect(pdf.headers()["content-type"]).toContain("application/pdf");
    expect((await pdf.body()).subarray(0, 5).toString()).toBe("%PDF-");
  });

  it("publishes version 2 with a shorter pulse, and both see the same change", async () => {
    const { page } = therapist;
    await page.goto(`${clientPath}/programme`);
    const builder = new ProgrammeBuilderPage(page);
    await whenInteractive(page.getByRole("button", { name: "Publish this version" }));
    await builder.setNumber(1, "Phase duration (µs)", "250");
    await builder.publish("Pinkness lasting into the evening under channel 1: shorter pulses.");
    await expect.poll(() => builder.publishedNotice().textContent(), POLL).toContain("Pulse duration, channel 1: 300 µs → 250 µs");

    await page.goto(`${clientPath}/programme/versions`);
    expect(await page.getByRole("region", { name: "Changes from version 1 to version 2" }).textContent()).toContain("Pulse duration, channel 1: 300 µs → 250 µs");

    await clientSession.page.goto("/programme");
    const change = clientSession.page.getByRole("region", { name: "Changes from version 1 to version 2" });
    await change.waitFor();
    expect(await change.textContent()).toContain("Pulse duration, channel 1: 300 µs → 250 µs");
  });

  it("shows a red flag without clearance as a reason the programme cannot be published", async () => {
    // The demo client Brenda was screened with a pacemaker and no clearance has been recorded.
    const { page } = therapist;
    await page.goto("/clients/demo-client-brenda/programme?start=blank");
    const builder = new ProgrammeBuilderPage(page);
    await whenInteractive(page.getByRole("button", { name: "Publish this version" }));
    await expect.poll(() => builder.stillToSortOut().textContent(), POLL).toContain(
      "Pacemaker, defibrillator or other active implant: record a named clinician's clearance before publishing.",
    );
  });
});
