import type { Page } from "playwright-core";
import { formAround, whenInteractive } from "../support/hydration";

export class ForgotPasswordPage {
  constructor(private readonly page: Page) {}

  async open() {
    await this.page.goto("/forgot-password");
  }

  heading() {
    return this.page.getByRole("heading", { level: 1 });
  }

  emailField() {
    return this.page.getByLabel("E-mail address", { exact: true });
  }

  async askForLink(email: string) {
    await whenInteractive(formAround(this.emailField()));
    await this.emailField().fill(email);
    await this.page.getByRole("button", { name: "Send the link" }).click();
  }

  confirmation() {
    return this.page.getByRole("status").filter({ hasText: "Check your e-mail" });
  }
}
