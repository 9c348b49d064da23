import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser, newContext } from "./support/browser";
import { demo } from "./support/demo-accounts";
import { POLL } from "./support/form-fields";
import { whenInteractive } from "./support/hydration";
import { accessibilityProblems } from "./support/page-security";
import { signInAndWaitForHome, signInAs } from "./support/people";

// The guided session on a phone, with the browser's clock faked so the timer can be stepped to exact moments.
// Arthur's seeded programme (db/seed): 1 s ramp up, 5 s hold, 1 s ramp down, 25 s rest (a 32 s cycle), 30 minutes.
const PHONE = { width: 390, height: 844 };

// Page object for /session, found by role and label. (Kept in this file: the session has no other browser test.)
class SessionPage {
  constructor(readonly page: Page) {}

  async open() {
    await this.page.goto("/session");
    await this.page.getByRole("heading", { level: 1 }).waitFor();
  }
  stepHeading() {
    return this.page.getByRole("heading", { level: 2, name: /^Step \d of 3/ });
  }
  checkboxes() {
    return this.page.getByRole("group", { name: "Tick each one when it is done" }).getByRole("checkbox");
  }
  startTimerStep() {
    return this.page.getByRole("button", { name: "Start the session timer" });
  }
  startTimer() {
    return this.page.getByRole("button", { name: "My stimulator is running: start the timer" });
  }
  phase() {
    return this.page.getByRole("timer", { name: /: phase$/ }).first();
  }
  sessionLeft() {
    return this.page.getByRole("timer", { name: "Session time left" });
  }
  announcement() {
    return this.page.getByRole("status").filter({ hasText: /./ });
  }
  logLink() {
    return this.page.getByRole("link", { name: "Log this session" });
  }

  async tickAll() {
    const boxes = this.checkboxes();
    await whenInteractive(boxes.first());
    for (let i = 0; i < (await boxes.count()); i += 1) await boxes.nth(i).check();
  }

  // Stops the page's clock a moment ahead of where it is, so the next press happens at a known instant.
  async pauseClock() {
    const now = await this.page.evaluate(() => Date.now());
    await this.page.clock.pauseAt(now + 1_000);
  }

  async expectPhase(word: string, left?: string) {
    await expect.poll(() => this.phase().textContent(), POLL).toContain(word);
    if (left) expect(await this.phase().textContent()).toContain(`${left} left in this phase`);
  }
}

// axe waits on the page's timers, which stand still while the fake clock is paused, so time flows while it runs.
async function expectNoAxeViolations(page: Page) {
  await page.clock.resume();
  expect(await accessibilityProblems(page)).toEqual([]);
}

let browser: Browser;
let context: BrowserContext;
let session: SessionPage;

beforeAll(async () => {
  browser = await launchBrowser();
  context = await newContext(browser, { viewport: PHONE });
  // Installed before any page opens, so every page of this context runs on the fake clock from its first script.
  // Time flows normally until a test pauses it.
  await context.clock.install({ time: new Date("2026-03-02T09:00:00Z") });
  const page = await context.newPage();
  await signInAndWaitForHome(page, demo.client.email, demo.password, "/today");
  session = new SessionPage(page);
});

afterAll(async () => {
  await context?.close();
  await browser?.close();
});

describe("the guided session", () => {
  it("step 1: asks for every item of the checklist before the timer", async () => {
    await session.open();
    const { page } = session;
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("Your session");
    expect(await session.stepHeading().textContent()).toBe("Step 1 of 3Before you start");
    const main = (await page.locator("main").textContent()) ?? "";
    for (const caution of ["strength at zero and turn it up slowly", "Stop at once if it hurts or burns", "front of the neck, across the chest, or over broken skin"]) {
      expect(main).toContain(caution);
    }
    expect(await page.getByRole("link", { name: /See the settings of version \d+/ }).getAttribute("href")).toBe("/programme");
    await expectNoAxeViolations(page);

    await whenInteractive(session.checkboxes().first());
    const count = await session.checkboxes().count();
    // The version's skin-preparation steps, then the placement and the settings.
    expect(count).toBeGreaterThanOrEqual(3);
    expect(await session.startTimerStep().isDisabled()).toBe(true);
    // Ticked with the keyboard: focus a box and press Space.
    for (let i = 0; i < count - 1; i += 1) {
      await session.checkboxes().nth(i).focus();
      await page.keyboard.press("Space");
    }
    await expect.poll(() => page.getByText("1 still to do", { exact: false }).count(), POLL).toBe(1);
    expect(await session.startTimerStep().isDisabled()).toBe(true);
    await session.checkboxes().nth(count - 1).check();
    await expect.poll(() => session.startTimerStep().isDisabled(), POLL).toBe(false);
    await session.startTimerStep().click();
    await expect.poll(() => session.stepHeading().textContent(), POLL).toBe("Step 2 of 3The session timer");
    // Focus moves to the new step's heading, so a screen reader says where the person now is.
    expect(await page.evaluate(() => document.activeElement?.textContent)).toBe("Step 2 of 3The session timer");
    expect(await page.locator("main").textContent()).toContain("Stop and check your skin if it hurts or burns");
    expect(await page.getByRole("checkbox", { name: /Sound at each change of phase/ }).isChecked()).toBe(false);
    await expectNoAxeViolations(page);
  });

  it("step 2: follows the cycle to the exact moment, and a pause counts for nothing", async () => {
    const { page } = session;
    await session.pauseClock();
    await session.startTimer().click();
    await session.expectPhase("Ramp up", "1 s");
    expect(await session.announcement().textContent()).toBe("Cycle 1. Ramp up, 1 second.");

    // worked example (our own arithmetic): the hold runs from 1 s to 6 s, so at 2 s 4 s are left.
    await page.clock.runFor(2_000);
    await session.expectPhase("Hold", "4 s");
    await expect.poll(() => session.announcement().textContent(), POLL).toBe("Hold, 5 seconds.");
    // The main button kept focus as it turned from Start into Pause.
    expect(await page.evaluate(() => document.activeElement?.textContent)).toBe("Pause the timer");

    // worked example (our own arithmetic): the ramp-down runs from 6 s to 7 s; at 6.5 s half a second is left.
    await page.clock.runFor(4_500);
    await session.expectPhase("Ramp down", "1 s");

    // worked example (our own arithmetic): the rest runs from 7 s to 32 s; at 8 s 24 s are left, and 1800 − 8 =
    // 1792 s = 29 min 52 s of the session.
    await page.clock.runFor(1_500);
    await session.expectPhase("Rest", "24 s");
    expect(await session.sessionLeft().textContent()).toContain("29 min 52 s");

    await page.getByRole("button", { name: "Pause the timer" }).click();
    await expect.poll(() => session.announcement().textContent(), POLL).toBe("Timer paused.");
    await page.clock.runFor(60_000);
    // A minute later nothing has moved.
    await session.expectPhase("Paused", "24 s");
    expect(await session.phase().textContent()).toContain("Rest");
    expect(await session.sessionLeft().textContent()).toContain("29 min 52 s");

    await page.getByRole("button", { name: "Resume the timer" }).click();
    await page.clock.runFor(1_000);
    // worked example (our own arithmetic): 9 s counted (the paused minute left out): 23 s of the rest left.
    await session.expectPhase("Rest", "23 s");

    // worked example (our own arithmetic): 32 s counted opens cycle 2 with its ramp-up.
    await page.clock.runFor(23_000);
    await session.expectPhase("Ramp up", "1 s");
    expect(await session.phase().locator("xpath=..").textContent()).toContain("Cycle 2");
    await expect.poll(() => session.announcement().textContent(), POLL).toBe("Cycle 2. Ramp up, 1 second.");
    await expectNoAxeViolations(page);
    await session.pauseClock();
  });

  it("step 3: at the end of the 30 minutes, offers the log with the minutes done", async () => {
    const { page } = session;
    await page.clock.fastForward("30:00");
    await expect.poll(() => session.stepHeading().textContent(), POLL).toBe("Step 3 of 3After the session");
    expect(await session.logLink().getAttribute("href")).toBe("/check-in?minutes=30");
    expect(await page.getByRole("link", { name: "Not now" }).getAttribute("href")).toBe("/today");
    expect(await page.getByRole("heading", { name: "Look at the skin under each electrode now" }).count()).toBe(1);
    expect(await page.getByRole("group", { name: "Looking after the electrodes" }).getByRole("checkbox").count()).toBeGreaterThan(0);
    await expectNoAxeViolations(page);
  });

  it("survives a reload while running, and a confirmed Stop offers the whole minutes done", async () => {
    // A new tab: its own sessionStorage, so this session starts from step 1.
    const page = await context.newPage();
    const other = new SessionPage(page);
    await other.open();
    await other.tickAll();
    await other.startTimerStep().click();
    await whenInteractive(other.startTimer());
    await other.startTimer().click();
    await page.clock.fastForward("05:30");
    await expect.poll(() => other.sessionLeft().textContent(), POLL).toMatch(/^2[34] min/);

    await page.reload();
    await whenInteractive(page.getByRole("button", { name: "Pause the timer" }));
    await expect.poll(() => other.stepHeading().textContent(), POLL).toBe("Step 2 of 3The session timer");
    await expect.poll(() => other.sessionLeft().textContent(), POLL).toMatch(/^2[34] min/);

    await page.getByRole("button", { name: "Stop the session" }).click();
    const question = page.getByRole("heading", { name: "Stop the session now?" });
    await expect.poll(() => question.evaluate((node) => node === document.activeElement), POLL).toBe(true);
    await page.keyboard.press("Escape");
    await expect.poll(() => page.evaluate(() => document.activeElement?.textContent), POLL).toBe("Stop the session");
    await page.getByRole("button", { name: "Stop the session" }).click();
    await page.getByRole("button", { name: "Yes, stop the session" }).click();
    await expect.poll(() => other.stepHeading().textContent(), POLL).toBe("Step 3 of 3After the session");
    // worked example (our own arithmetic): about 5 min 30 s done rounds down to 5 whole minutes.
    expect(await other.logLink().getAttribute("href")).toBe("/check-in?minutes=5");
    expect(await page.locator("main").textContent()).toContain("Stopped after 5 minutes of 30");
    await page.close();
  });

  it("speaks to a carer about the client", async () => {
    const carer = await signInAs(browser, demo.carer.email, "/today");
    await carer.page.goto("/session");
    expect(await carer.page.getByRole("heading", { level: 1 }).textContent()).toBe("Arthur's session");
    await carer.context.close();
  });
});
