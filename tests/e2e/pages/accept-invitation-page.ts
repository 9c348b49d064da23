import type { Page } from "playwright-core";
import { formAround, whenInteractive } from "../support/hydration";

// /invitations/:id, where an invited person chooses a name and password.
export class AcceptInvitationPage {
  constructor(private readonly page: Page) {}

  async open(link: string) {
    return this.page.goto(link);
  }

  heading() {
    return this.page.getByRole("heading", { level: 1 });
  }

  // The sentence under the heading: who invited which address, in which role.
  invitedLine() {
    return this.page.getByRole("main").getByText(/ invited /);
  }

  nameField() {
    return this.page.getByLabel("Your name", { exact: true });
  }

  passwordField() {
    return this.page.getByLabel("Choose a password", { exact: true });
  }

  repeatField() {
    return this.page.getByLabel("Type it again", { exact: true });
  }

  submitButton() {
    return this.page.getByRole("button", { name: "Accept and continue" });
  }

  async fill(name: string, password: string, repeated = password) {
    await whenInteractive(formAround(this.nameField()));
    await this.nameField().fill(name);
    await this.passwordField().fill(password);
    await this.repeatField().fill(repeated);
  }

  async accept(name: string, password: string, repeated = password) {
    await this.fill(name, password, repeated);
    await this.submitButton().click();
  }

  async acceptAndWaitForHome(name: string, password: string, homePath: string) {
    await this.accept(name, password);
    await this.page.waitForURL((url) => url.pathname === homePath);
  }

  problem() {
    return this.page.getByRole("main").filter({ hasText: "Cannot be used" });
  }
}
