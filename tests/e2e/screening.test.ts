import AxeBuilder from "@axe-core/playwright";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CaseloadPage } from "./pages/caseload-page";
import { ScreeningFormPage } from "./pages/screening-form-page";
import { launchBrowser } from "./support/browser";
import { demo } from "./support/demo-accounts";
import { POLL } from "./support/form-fields";
import { whenInteractive } from "./support/hydration";
import { signInAs, uniqueEmail, type Session } from "./support/people";

// The history page's object; the checklist's is in pages/screening-form-page.ts.
class ScreeningHistoryPage {
  constructor(private readonly page: Page) {}

  // The page-wide notice comes first; each uncleared red flag repeats the word in its own notice below.
  gateNotice() {
    return this.page.getByText("Blocks publishing", { exact: true }).first().locator("xpath=ancestor::div[1]");
  }

  flags() {
    return this.page.getByRole("list", { name: "Systemic red flags" });
  }

  clearanceForm(flagLabel: string) {
    return this.page.getByRole("form", { name: `Clearance for ${flagLabel}` });
  }
}

const pacemaker = "Pacemaker, defibrillator or other active implant";
// Invented person; a new address every run so reruns against the same database do not collide.
const client = { name: "Maren Tolliver", email: uniqueEmail("screening-client") };

function isoDaysAhead(days: number): string {
  const date = new Date();
  date.setDate(date.getDate() + days);
  return date.toISOString().slice(0, 10);
}

async function expectNoAxeViolations(page: Page) {
  const { violations } = await new AxeBuilder({ page }).analyze();
  expect(violations.map((v) => `${v.id}: ${v.help} at ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`)).toEqual([]);
}

let browser: Browser;
let therapist: Session;
let clientPath: string;

beforeAll(async () => {
  browser = await launchBrowser();
  therapist = await signInAs(browser, demo.therapist.email, "/caseload");
  const caseload = new CaseloadPage(therapist.page);
  await whenInteractive(caseload.nameField());
  await caseload.invite(client.name, client.email);
  await caseload.clientRow(client.email).waitFor();
  // Found by the new address, not the name: earlier runs left clients with the same name on the demo caseload.
  const href = await caseload.clientRow(client.email).getByRole("link", { name: client.name, exact: true }).getAttribute("href");
  if (!href) throw new Error(`No link to ${client.name} on the caseload`);
  clientPath = href;
});

afterAll(async () => {
  await therapist?.context.close();
  await browser?.close();
});

// One story in order: a first screening with a pacemaker, the block it puts on publishing, and its clearance.
describe("screening a new client", () => {
  it("shows the checklist with no accessibility problems that axe can find", async () => {
    const { page } = therapist;
    await page.goto(`${clientPath}/screening/new`);
    const form = new ScreeningFormPage(page);
    await whenInteractive(form.signButton());
    expect(await form.signButton().textContent()).toBe(`Sign screening as ${demo.therapist.name}`);
    for (const section of ["A. Context", "B. Systemic red flags", "C. Electrode sites", "D. Capacity to self-manage", "E. Test stimulation in clinic", "F. Outcome"]) {
      expect(await page.getByRole("heading", { level: 2, name: section }).count(), section).toBe(1);
    }
    await expectNoAxeViolations(page);
  });

  it("lists the red flag before signing and refuses 'eligible' while it stands", async () => {
    const { page } = therapist;
    const form = new ScreeningFormPage(page);
    await form.fillClean({ pacemaker: true, rescreenOn: isoDaysAhead(90) });

    const summary = page.getByRole("region", { name: "Check and sign" });
    await expect.poll(() => summary.textContent(), POLL).toContain(pacemaker);

    await form.signButton().click();
    // common practice (no published source): an outcome of "eligible" is refused while a red flag stands.
    await expect.poll(() => form.errorOf("Outcome of this screening").textContent(), POLL).toContain("Choose “Eligible with precautions” or “Not eligible”.");
    expect(new URL(page.url()).pathname).toBe(`${clientPath}/screening/new`);
  });

  it("signs the screening in the therapist's name and shows that it blocks publishing", async () => {
    const { page } = therapist;
    const form = new ScreeningFormPage(page);
    await form.answer("Outcome of this screening", "Eligible with precautions");
    await page.getByLabel("Precautions or reasons", { exact: true }).fill("Await the cardiologist's clearance; keep electrodes well away from the chest.");
    await form.signButton().click();
    await page.waitForURL((url) => url.pathname === `${clientPath}/screening`);

    await expect.poll(() => page.getByRole("status").filter({ hasText: "Signed" }).textContent(), POLL).toContain("Version 1 is signed in your name.");
    const history = new ScreeningHistoryPage(page);
    expect(await history.gateNotice().textContent()).toContain(`${pacemaker}: record a named clinician's clearance before publishing.`);
    const versions = page.getByRole("table", { name: "Signed screenings, newest first" });
    expect(await versions.getByRole("row").nth(1).textContent()).toContain(demo.therapist.name);
    await whenInteractive(history.clearanceForm(pacemaker).getByRole("button", { name: "Record clearance" }));
    await expectNoAxeViolations(page);
  });

  it("records a named clinician's clearance and shows the flag cleared", async () => {
    const { page } = therapist;
    const history = new ScreeningHistoryPage(page);
    const clearance = history.clearanceForm(pacemaker);
    await whenInteractive(clearance.getByRole("button", { name: "Record clearance" }));
    await clearance.getByRole("button", { name: "Record clearance" }).click();
    await expect.poll(() => clearance.textContent(), POLL).toContain("Enter the name and role of the clinician");

    await clearance.getByLabel("Clinician who gave the clearance", { exact: true }).fill("Dr Ama Okafor, cardiologist");
    await clearance.getByLabel("What the clearance covers", { exact: true }).fill("Letter of 3 March: forearm stimulation is compatible with the device.");
    await clearance.getByRole("button", { name: "Record clearance" }).click();

    await expect.poll(() => history.flags().textContent(), POLL).toContain("Cleared by Dr Ama Okafor, cardiologist");
    expect(await page.getByText("Blocks publishing", { exact: true }).count()).toBe(0);
    expect(await page.getByText("Screening complete", { exact: true }).count()).toBe(1);
    expect(await history.clearanceForm(pacemaker).count()).toBe(0);
  });

  it("shows every answer of the signed version, read-only", async () => {
    const { page } = therapist;
    await page.getByRole("link", { name: "Version 1", exact: true }).click();
    await page.waitForURL((url) => url.pathname === `${clientPath}/screening/versions/1`);
    await page.getByRole("heading", { level: 1, name: `Screening version 1: ${client.name}` }).waitFor();
    const text = (await page.locator("main").textContent()) ?? "";
    expect(text).toContain("Right wrist and finger extensors");
    expect(text).toContain("about 8 months");
    expect(await page.getByRole("radio").count()).toBe(0);
  });
});
