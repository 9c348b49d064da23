import type { Page } from "playwright-core";
import { formAround, whenInteractive } from "../support/hydration";

export class ResetPasswordPage {
  constructor(private readonly page: Page) {}

  newPasswordField() {
    return this.page.getByLabel("New password", { exact: true });
  }

  repeatField() {
    return this.page.getByLabel("Type it again", { exact: true });
  }

  async choose(password: string, repeated = password) {
    await whenInteractive(formAround(this.newPasswordField()));
    await this.newPasswordField().fill(password);
    await this.repeatField().fill(repeated);
    await this.page.getByRole("button", { name: "Save the new password" }).click();
  }

  // The form's own alert, picked out by its word because Next's route announcer also has role=alert.
  alert() {
    return this.page.getByRole("alert").filter({ hasText: "Not saved" });
  }
}
