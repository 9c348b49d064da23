import type { Page } from "playwright-core";
import { mailboxUrl } from "../support/mailbox";

// One message in the mail fake's inbox, read the way a person reads it: in a browser, following a link.
export class MailboxMessagePage {
  constructor(private readonly page: Page) {}

  async open(messageId: string) {
    await this.page.goto(`${mailboxUrl()}/messages/${encodeURIComponent(messageId)}`);
  }

  heading() {
    return this.page.getByRole("heading", { level: 1 });
  }

  // The page lists every link again as a plain anchor whose words are the address itself.
  async follow(href: string) {
    await this.page.getByRole("link", { name: href, exact: true }).first().click();
  }
}
