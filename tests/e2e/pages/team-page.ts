import type { Page } from "playwright-core";
import { formAround, whenInteractive } from "../support/hydration";

// The clinic admin's /team page: inviting therapists, the staff table and the invitations still waiting.
export class TeamPage {
  constructor(private readonly page: Page) {}

  async open() {
    await this.page.goto("/team");
  }

  nameField() {
    return this.page.getByLabel("Therapist's name", { exact: true });
  }

  emailField() {
    return this.page.getByLabel("Work e-mail address", { exact: true });
  }

  async invite(name: string, email: string) {
    await whenInteractive(formAround(this.nameField()));
    await this.nameField().fill(name);
    await this.emailField().fill(email);
    await this.page.getByRole("button", { name: "Send invitation" }).click();
  }

  sentNotice() {
    return this.page.getByRole("status").filter({ hasText: "Invitation sent" });
  }

  staffRow(email: string) {
    return this.page.getByRole("table", { name: "Clinic staff" }).getByRole("row").filter({ hasText: email });
  }

  waitingInvitations() {
    return this.page.locator("section").filter({ has: this.page.getByRole("heading", { name: "Invitations waiting" }) });
  }
}
