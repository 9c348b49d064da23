import AxeBuilder from "@axe-core/playwright";
import type { Browser, BrowserContext, Locator, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser, newContext } from "./support/browser";

// Page object for /explore, found by role and label. (Kept in this file for now; it can move to pages/.)
class ExplorePage {
  constructor(private readonly page: Page) {}

  field(label: string) {
    return this.page.getByLabel(label, { exact: true });
  }

  async set(label: string, value: string) {
    await this.field(label).fill(value);
  }

  /** The value cell of a derived figure's row, spaces normalised. */
  async figure(name: string) {
    const row = this.page.getByRole("row", { name: new RegExp(`^${name}\\b`) });
    return normalise(await row.getByRole("cell").textContent());
  }

  cycle() {
    return this.page.getByRole("img", { name: "The on/off cycle, to scale" });
  }

  pulse() {
    return this.page.getByRole("img", { name: "One pulse and the gap to the next" });
  }

  async findings() {
    return (await this.page.getByRole("list", { name: "Findings" }).getByRole("listitem").allTextContents()).map(normalise);
  }
}

const normalise = (text: string | null) => (text ?? "").replace(/\s+/g, " ").trim();

/** The accessible description of an SVG image, read from the element its aria-describedby points to. */
async function descriptionOf(image: Locator) {
  return normalise(await image.evaluate((el) => document.getElementById(el.getAttribute("aria-describedby") ?? "")?.textContent ?? null));
}

async function drawingText(image: Locator) {
  return (await image.locator("text").allTextContents()).map(normalise);
}

async function expectNoAxeViolations(page: Page) {
  const { violations } = await new AxeBuilder({ page }).analyze();
  expect(violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`)).toEqual([]);
}

let browser: Browser;
let context: BrowserContext;
beforeAll(async () => {
  browser = await launchBrowser();
  context = await newContext(browser);
});
afterAll(async () => {
  await context?.close();
  await browser?.close();
});

describe("the settings explorer", () => {
  it("opens from the landing page without signing in and redraws as the settings change", async () => {
    const page = await context.newPage();
    const policyProblems: string[] = [];
    page.on("console", (message) => {
      if (/Content Security Policy|Refused to/i.test(message.text())) policyProblems.push(message.text());
    });
    await page.goto("/");
    await page.getByRole("link", { name: "Try the settings explorer" }).click();
    await page.waitForURL((url) => url.pathname === "/explore");
    await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent()).toBe("Settings explorer");
    const explore = new ExplorePage(page);
    await expect.poll(() => page.getByText("an example starting point, not a recommendation").count()).toBe(1);

    // The example: 35 Hz, 300 µs symmetric biphasic, ramps 1 s, hold 5 s, rest 20 s.
    // source: standard circuit arithmetic, period = 1/f = 1/35 s ≈ 28,571 µs
    await expect.poll(() => explore.figure("Pulse period")).toBe("28,571 µs");
    expect(await drawingText(explore.pulse())).toContain("phase 1: 300 µs");
    expect(await descriptionOf(explore.cycle())).toContain("2 cycles of 27 s each");
    const before = await explore.findings();
    expect(before.some((f) => f.includes("Blocks publishing"))).toBe(false);
    expect(before.some((f) => f.includes("Pulse duration: Usual for strengthening"))).toBe(true);
    await expectNoAxeViolations(page);

    await explore.set("Frequency (Hz)", "50");
    // source: standard circuit arithmetic, 1/50 s = 20,000 µs
    await expect.poll(() => explore.figure("Pulse period")).toBe("20,000 µs");
    await expect.poll(() => descriptionOf(explore.pulse())).toContain("period 20,000 µs (50 Hz)");
    // The frequency band note moves from 20–35 Hz to above 35 Hz. common practice (no published source)
    await expect.poll(async () => (await explore.findings()).some((f) => f.includes("Frequency: Smooth, stronger contraction"))).toBe(true);

    await explore.set("Phase duration (µs)", "400");
    await expect.poll(() => drawingText(explore.pulse())).toContain("phase 1: 400 µs");
    // source: REFERENCES formula I·sqrt(2·t·f) for symmetric biphasic: 40 mA × sqrt(2 × 400 µs × 50 Hz) = 8 mA
    await expect.poll(() => explore.figure("r.m.s. current during the pulse train")).toBe("8 mA");
    // Above 300 µs the band note changes to "long". common practice (no published source)
    await expect.poll(async () => (await explore.findings()).some((f) => f.includes("Pulse duration: Long (above 300 µs)"))).toBe(true);

    await explore.set("Hold (s)", "8");
    await explore.set("Rest (s)", "10");
    // source: arithmetic, 1 + 8 + 1 + 10 = 20 s per cycle
    await expect.poll(() => descriptionOf(explore.cycle())).toContain("2 cycles of 20 s each, 40 s in all");
    await expect.poll(() => explore.figure("Cycle length")).toBe("20 s");

    // Two 400 µs phases cannot fit in the 500 µs period of 2,000 Hz. source: standard circuit arithmetic
    await explore.set("Frequency (Hz)", "2000");
    await expect.poll(async () => (await explore.findings())[0] ?? "").toMatch(/^■\s*Blocks publishing\s*·\s*Pulses overlap/);
    await expect.poll(() => descriptionOf(explore.pulse())).toContain("longer than the period");
    expect(await drawingText(explore.pulse())).toContain("next pulse starts here");
    await expectNoAxeViolations(page);

    // A blank box gets the analysis's own message on the field itself.
    await explore.field("Frequency (Hz)").fill("");
    await expect.poll(() => explore.field("Frequency (Hz)").getAttribute("aria-invalid")).toBe("true");
    await expect.poll(() => page.getByText("Enter the frequency (Hz).").count()).toBeGreaterThan(0);
    await expect.poll(() => explore.cycle().count()).toBe(0);
    await explore.set("Frequency (Hz)", "35");
    await expect.poll(() => explore.field("Frequency (Hz)").getAttribute("aria-invalid")).toBeNull();
    await expect.poll(() => explore.cycle().count()).toBe(1);

    expect(policyProblems).toEqual([]);
    await page.close();
  });

  it("answers the analysis over HTTP: 200 for settings that parse, 400 with field messages for ones that do not", async () => {
    const settings = {
      frequencyHz: 35,
      phaseDurationUs: 300,
      waveform: { kind: "symmetric-biphasic" },
      rampUpS: 1,
      holdS: 5,
      rampDownS: 1,
      restS: 20,
      amplitudeCeilingMa: 50,
      sessionMinutes: 30,
      sessionsPerDay: 1,
      daysPerWeek: 5,
      electrodes: [
        { shape: "round", diameter: 2, unit: "in" },
        { shape: "round", diameter: 2, unit: "in" },
      ],
    };
    const good = await context.request.post("/api/stim/analyse", { data: settings });
    expect(good.status()).toBe(200);
    expect(good.headers()["cache-control"]).toBe("no-store");
    const analysis = (await good.json()) as { ok: boolean; derived: { current: { rmsTrainMa: number } } };
    expect(analysis.ok).toBe(true);
    // source: REFERENCES.md check values (our own arithmetic): symmetric biphasic 50 mA, 300 µs, 35 Hz → 7.246 mA
    expect(Math.abs(analysis.derived.current.rmsTrainMa - 7.246) / 7.246).toBeLessThan(1e-3);

    const bad = await context.request.post("/api/stim/analyse", { data: { ...settings, frequencyHz: 0, sessionsPerDay: 1.5 } });
    expect(bad.status()).toBe(400);
    const error = (await bad.json()) as { error: { code: string; fields: Record<string, string> } };
    expect(error.error.code).toBe("VALIDATION");
    expect(Object.keys(error.error.fields).sort()).toEqual(["frequencyHz", "sessionsPerDay"]);

    const notJson = await context.request.post("/api/stim/analyse", { data: "35 Hz", headers: { "content-type": "text/plain" } });
    expect(notJson.status()).toBe(415);
  });
});
