import type { Page } from "playwright-core";
import { whenInteractive } from "../support/hydration";

// The header every signed-in screen shares: who is signed in, and the way out.
export class AppHeader {
  constructor(private readonly page: Page) {}

  banner() {
    return this.page.getByRole("banner");
  }

  async signOut() {
    await (await whenInteractive(this.page.getByRole("button", { name: "Sign out" }))).click();
    await this.page.waitForURL((url) => url.pathname === "/sign-in");
  }
}
