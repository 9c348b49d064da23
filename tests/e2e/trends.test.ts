import AxeBuilder from "@axe-core/playwright";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { demoCarers, demoClients, demoTherapists } from "@/db/seed/demo-clinic";
import { formatDay } from "@/lib/trends/format";
import { launchBrowser } from "./support/browser";
import { demo } from "./support/demo-accounts";
import { httpRequest, httpSignIn } from "./support/http";
import { signInAs, type Session } from "./support/people";

// The therapist's trends for the demo client Callum (two channels, two programme versions): the test logs two
// sessions of its own through the check-in API, one as Callum and one as his brother Ian, his carer, then checks
// that Owen, his therapist, finds them in the charts' tables, with the version markers, and that axe finds nothing.
const callum = demoClients.find((person) => person.key === "callum")!;
const ian = demoCarers.find((person) => person.key === "ian")!;
const owen = demoTherapists.find((person) => person.key === "owen")!;
const trendsPath = "/clients/demo-client-callum/trends";
const today = new Intl.DateTimeFormat("en-CA", { timeZone: "Europe/London" }).format(new Date());

// Figures the demo's own logs never use (whole mA from 13 to 30, comfort 6 to 8), so the rows found are these.
const byCallum = { minutes: 17, comfort: 2, amplitudes: { "ch-1": 17.5, "ch-2": 31.5 }, skin: { "ch-2B": 4 } };
const byIan = { minutes: 23, comfort: 9, amplitudes: { "ch-1": 23.5, "ch-2": 12.5 }, skin: {} };

function body(entry: typeof byCallum | typeof byIan) {
  const skin = entry.skin as Partial<Record<string, number>>;
  return {
    sessionDate: today,
    // Said outright: until the client confirms the newest version on the stimulator, a log must name its version.
    versionNumber: 2,
    minutes: entry.minutes,
    comfort: entry.comfort,
    movement: "partial",
    fatigue: "mild",
    channels: Object.entries(entry.amplitudes).map(([channelId, amplitudeMa]) => ({ channelId, amplitudeMa })),
    skin: ["ch-1", "ch-2"].flatMap((channelId) =>
      (["A", "B"] as const).map((electrode) => ({ channelId, electrode, level: skin[`${channelId}${electrode}`] ?? 1, spreads: false, itch: false, photoIds: [] })),
    ),
    electrodeCondition: "fine",
  };
}

async function logSession(email: string, entry: typeof byCallum | typeof byIan) {
  const cookie = await httpSignIn(email, demo.password);
  const response = await httpRequest("POST", "/api/clients/demo-client-callum/check-ins", { cookie, body: body(entry) });
  expect(response.status, response.text).toBe(201);
}

// Page object for the trends page: each chart is a region named by its heading, its table named by its caption.
class TrendsPage {
  constructor(readonly page: Page) {}
  async open(path = trendsPath) {
    await this.page.goto(path);
    await this.page.getByRole("heading", { level: 1, name: "Trends over time" }).waitFor();
  }
  chart(title: string) {
    return this.page.getByRole("region", { name: title });
  }
  table(caption: string | RegExp) {
    return this.page.getByRole("table", { name: caption });
  }
  // The cells of this test's session in a table (once its disclosure is open): the row holding a figure only that
  // session has.
  cells(caption: string | RegExp, text: string) {
    return this.table(caption).getByRole("row").filter({ hasText: text }).first().locator("th, td").allTextContents();
  }
  async openAllTables() {
    for (const summary of await this.page.locator("details > summary").all()) await summary.click();
  }
}

let browser: Browser;
let therapist: Session;

beforeAll(async () => {
  await logSession(callum.email, byCallum);
  await logSession(ian.email, byIan);
  browser = await launchBrowser();
  therapist = await signInAs(browser, owen.email, "/caseload");
});

afterAll(async () => {
  await therapist?.context.close();
  await browser?.close();
});

describe("the therapist's trends for a client", () => {
  it("lists the sessions in the charts' tables, a carer's marked as the carer's", async () => {
    const trends = new TrendsPage(therapist.page);
    await trends.open();
    await trends.openAllTables();
    const day = formatDay(today);
    const mA = (n: number) => `${n}\u00a0mA`;
    // Both channels of Callum's version 2 have a 30 mA ceiling (db/seed/seed-programmes.ts).
    const ceiling = ` (ceiling ${mA(30)})`;

    expect(await trends.cells(/^Amplitude reached per session/, mA(17.5))).toEqual([day, "v2", mA(17.5) + ceiling, `${mA(31.5)}${ceiling}above the ceiling`, callum.name]);
    expect(await trends.cells(/^Amplitude reached per session/, mA(23.5))).toEqual([day, "v2", mA(23.5) + ceiling, mA(12.5) + ceiling, `${ian.name} (carer)`]);
    expect(await trends.cells(/^Comfort per session/, "2/10")).toEqual([day, "v2", "2/10", "17", callum.name]);
    expect(await trends.cells(/^Comfort per session/, "9/10")).toEqual([day, "v2", "9/10", "23", `${ian.name} (carer)`]);
    expect(await trends.cells(/^Worst skin level per session/, "4: Itchy bumps")).toEqual([day, "v2", "4: Itchy bumps or a rash", "Channel 2, electrode B", callum.name]);

    const [week, sessions, minutes, versions] = await trends.cells(/^Sessions and minutes delivered/, "this week, so far");
    expect(week).toContain(day);
    expect(sessions).toMatch(/^\d+ of [\d.]+ prescribed \(\d+%\)$/);
    expect(minutes).toMatch(/^[\d,]+ of [\d,.]+ prescribed \(\d+%\)$/);
    expect(versions).toBe("v2");
  });

  it("marks each programme version on its publication day, in the charts and in words", async () => {
    const page = therapist.page;
    // The versions page gives the publication time in London; the marker must sit on that day.
    await page.goto("/clients/demo-client-callum/programme/versions");
    const published = new Map<string, string>();
    for (const row of await page.getByRole("table", { name: "Published versions, newest first" }).getByRole("row").all()) {
      const cells = await row.getByRole("cell").allTextContents();
      if (cells.length > 1) published.set(cells[0]!.trim(), cells[1]!.split(",")[0]!.trim());
    }
    expect([...published.keys()].sort()).toEqual(["1", "2"]);

    const trends = new TrendsPage(page);
    await trends.open();
    const list = page.getByRole("region", { name: "Versions marked on the charts" });
    for (const [number, date] of published) {
      expect(await list.getByRole("listitem").filter({ hasText: `v${number}:` }).textContent()).toContain(`Version ${number} published`);
      expect(await list.textContent()).toContain(date);
    }
    for (const title of ["Amplitude reached per channel", "Comfort after each session", "Skin: the worst level per session"]) {
      const labels = trends.chart(title).locator("svg text");
      await expect.poll(() => labels.allTextContents()).toEqual(expect.arrayContaining(["v1", "v2"]));
    }
  });

  it("passes axe with every table open, and says what to do when nothing has been logged", async () => {
    const trends = new TrendsPage(therapist.page);
    await trends.open();
    await trends.chart("Adherence per week").locator(".recharts-bar-rectangle").first().waitFor();
    await trends.openAllTables();
    await expectNoAxeViolations(therapist.page);

    // Deepa, Owen's other demo client, has no programme yet.
    await trends.open("/clients/demo-client-deepa/trends");
    expect(await therapist.page.locator("main").textContent()).toContain("No programme published yet");
    await expectNoAxeViolations(therapist.page);
  });
});

async function expectNoAxeViolations(page: Page) {
  const { violations } = await new AxeBuilder({ page }).analyze();
  expect(violations.map((v) => `${v.id}: ${v.help} at ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`)).toEqual([]);
}
