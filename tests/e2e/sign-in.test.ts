import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { SignInPage } from "./pages/sign-in-page";
import { launchBrowser, newContext } from "./support/browser";
import { demo } from "./support/demo-accounts";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("signing in", () => {
  const homes = [
    { who: "clinic admin", person: demo.admin, home: "/team", heading: "Team" },
    { who: "therapist", person: demo.therapist, home: "/caseload", heading: "Caseload" },
    { who: "client", person: demo.client, home: "/today", heading: `Hello, ${demo.client.name.split(" ")[0]}` },
    { who: "carer", person: demo.carer, home: "/today", heading: `Hello, ${demo.carer.name.split(" ")[0]}` },
  ];

  for (const { who, person, home, heading } of homes) {
    it(`takes a ${who} to their own home`, async () => {
      const context = await newContext(browser);
      const page = await context.newPage();
      await new SignInPage(page).signInAndWaitForHome(person.email, demo.password, home);
      await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent()).toBe(heading);
      await context.close();
    });
  }

  it("explains a wrong password without saying whether the account exists", async () => {
    const context = await newContext(browser);
    const page = await context.newPage();
    const signIn = new SignInPage(page);
    await signIn.open();
    await signIn.signIn(demo.therapist.email, "not-the-password");
    await expect.poll(() => signIn.alert().textContent()).toContain("do not match");
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    await context.close();
  });
});
