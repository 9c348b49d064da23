import type { Page } from "playwright-core";
import { InviteCarerForm } from "./invite-carer-form";

// /clients/:id as clinic staff see it.
export class ClientPage {
  readonly carerForm: InviteCarerForm;

  constructor(private readonly page: Page) {
    this.carerForm = new InviteCarerForm(page);
  }

  async open(path: string) {
    await this.page.goto(path);
  }

  heading() {
    return this.page.getByRole("heading", { level: 1 });
  }

  carersSection() {
    return this.page.locator("section").filter({ has: this.page.getByRole("heading", { name: "Carers", exact: true }) });
  }

  carerEntry(email: string) {
    return this.carersSection().getByRole("listitem").filter({ hasText: email });
  }
}
