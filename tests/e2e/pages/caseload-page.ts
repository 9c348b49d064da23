import type { Page } from "playwright-core";
import { formAround, whenInteractive } from "../support/hydration";

// The therapist's /caseload: their clients and the form that creates and invites a new one.
export class CaseloadPage {
  constructor(private readonly page: Page) {}

  async open() {
    await this.page.goto("/caseload");
  }

  heading() {
    return this.page.getByRole("heading", { level: 1 });
  }

  emptyState() {
    return this.page.getByText("No clients yet", { exact: true });
  }

  nameField() {
    return this.page.getByLabel("Client's full name", { exact: true });
  }

  emailField() {
    return this.page.getByLabel("Client's e-mail address", { exact: true });
  }

  async invite(fullName: string, email: string) {
    await whenInteractive(formAround(this.nameField()));
    await this.nameField().fill(fullName);
    await this.emailField().fill(email);
    await this.page.getByRole("button", { name: "Create and invite" }).click();
  }

  sentNotice() {
    return this.page.getByRole("status").filter({ hasText: "Invitation sent" });
  }

  clientRows() {
    return this.page.getByRole("table", { name: "Your clients" }).getByRole("row");
  }

  clientRow(email: string) {
    return this.clientRows().filter({ hasText: email });
  }

  async clientPagePath(fullName: string): Promise<string> {
    const href = await this.page.getByRole("link", { name: fullName, exact: true }).getAttribute("href");
    if (!href) throw new Error(`No link to ${fullName} on the caseload`);
    return href;
  }
}
