import { expect } from "vitest";
import type { Page } from "playwright-core";
import { whenInteractive } from "../support/hydration";

// Page object for /sign-in, found by label and role as a person using a screen reader would.
export class SignInPage {
  constructor(private readonly page: Page) {}

  async open() {
    await this.page.goto("/sign-in");
  }

  async signIn(email: string, password: string) {
    await whenInteractive(this.page.getByRole("button", { name: "Sign in" }));
    await this.page.getByLabel("E-mail address").fill(email);
    await this.page.getByLabel("Password").fill(password);
    await this.page.getByRole("button", { name: "Sign in" }).click();
  }

  async signInAndWaitForHome(email: string, password: string, homePath: string) {
    await this.open();
    await this.signIn(email, password);
    await this.page.waitForURL((url) => url.pathname === homePath);
    expect(new URL(this.page.url()).pathname).toBe(homePath);
  }

  // Next adds its own (empty) route announcer with role=alert, so the form's alert is picked out by its words.
  alert() {
    return this.page.getByRole("alert").filter({ hasText: "Not signed in" });
  }
}
