import type { Locator, Page } from "playwright-core";
import { whenInteractive } from "../support/hydration";

// The therapist's programme builder (/clients/:id/programme), found by role and label.
export class ProgrammeBuilderPage {
  constructor(private readonly page: Page) {}

  async startFromTemplate(name: string) {
    const link = this.page.getByRole("link", { name: `Start from “${name}”` });
    await link.click();
    await this.page.getByRole("form", { name: "Programme" }).waitFor();
    await whenInteractive(this.page.getByRole("button", { name: "Publish this version" }));
  }

  channel(number: number): Locator {
    return this.page.getByRole("region", { name: new RegExp(`^Channel ${number}\\b`) });
  }

  async chooseSide(number: number, side: "Left" | "Right") {
    await this.channel(number).getByRole("radio", { name: side, exact: true }).check();
  }

  // The keyboard way to place an electrode: pick the part of the body by name, then place it there.
  async placeElectrode(number: number, letter: "A" | "B", zoneLabel: string) {
    const channel = this.channel(number);
    await channel.getByLabel(`Place electrode ${letter} on`, { exact: true }).selectOption({ label: zoneLabel });
    await channel.getByRole("button", { name: `Place electrode ${letter}`, exact: true }).click();
  }

  async setNumber(number: number, label: string, value: string) {
    const field = this.channel(number).getByLabel(label, { exact: true });
    await field.fill(value);
  }

  async addPhoto(number: number, file: { name: string; mimeType: string; buffer: Buffer }) {
    await this.channel(number).getByLabel("Placement photos", { exact: true }).setInputFiles(file);
  }

  photos(number: number) {
    return this.channel(number).getByRole("img", { name: /placement photo|^Photo \d/ });
  }

  saveStatus() {
    return this.page.getByRole("status").filter({ hasText: /Draft saved|Saving|Unsaved|No changes/ });
  }

  stillToSortOut() {
    return this.page.getByText("Still to sort out before publishing").locator("xpath=ancestor::div[1]");
  }

  async publish(reason: string) {
    await this.page.getByLabel("Reason for this version", { exact: true }).fill(reason);
    await this.page.getByRole("button", { name: "Publish this version" }).click();
  }

  publishedNotice() {
    return this.page.getByRole("status").filter({ hasText: /Version \d+ published/ });
  }
}
