import type { Locator, Page } from "playwright-core";
import { whenInteractive } from "../support/hydration";

// The carer invitation form, shown to a client on Today and to a therapist on the client's page. Everything is
// looked up inside the one form that asks for a carer's name, so other forms on the same page cannot be confused
// with it.
export class InviteCarerForm {
  readonly root: Locator;

  constructor(private readonly page: Page) {
    this.root = page.locator("form").filter({ has: page.getByLabel("Carer's name", { exact: true }) });
  }

  nameField() {
    return this.root.getByLabel("Carer's name", { exact: true });
  }

  emailField() {
    return this.root.getByLabel("Carer's e-mail address", { exact: true });
  }

  relationshipField() {
    return this.root.getByLabel("Relationship", { exact: true });
  }

  // The only checkbox in this form: the consent statement is its label.
  consentBox() {
    return this.root.getByRole("checkbox");
  }

  consentMethods(groupName: string) {
    return this.root.getByRole("group", { name: groupName });
  }

  verbalConsent() {
    return this.root.getByRole("radio", { name: "Told me in person or by phone" });
  }

  async fill(carer: { name: string; email: string; relationship: string }) {
    await whenInteractive(this.root);
    await this.nameField().fill(carer.name);
    await this.emailField().fill(carer.email);
    await this.relationshipField().fill(carer.relationship);
  }

  async submit() {
    await whenInteractive(this.root);
    await this.root.getByRole("button", { name: "Invite carer" }).click();
  }

  sentNotice() {
    return this.root.getByRole("status").filter({ hasText: "Invitation sent" });
  }

  carerEntry(email: string) {
    return this.page.getByRole("listitem").filter({ hasText: email });
  }
}
