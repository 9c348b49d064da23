import type { Page } from "playwright-core";
import { InviteCarerForm } from "./invite-carer-form";

// /today, the home of clients and carers.
export class TodayPage {
  readonly carerForm: InviteCarerForm;

  constructor(private readonly page: Page) {
    this.carerForm = new InviteCarerForm(page);
  }

  async open() {
    await this.page.goto("/today");
  }

  heading() {
    return this.page.getByRole("heading", { level: 1 });
  }

  emptyState() {
    return this.page.getByText("No programme yet", { exact: true });
  }

  helpingLine() {
    return this.page.getByText(/^You are helping /);
  }

  carersSection() {
    return this.page.locator("section").filter({ has: this.page.getByRole("heading", { name: "People who help you" }) });
  }
}
