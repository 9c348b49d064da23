import type { Page } from "playwright-core";
import { whenInteractive } from "../support/hydration";

// The client's session log (/check-in), found by role and label.
export class CheckInPage {
  constructor(private readonly page: Page) {}

  async open(query = "") {
    await this.page.goto(`/check-in${query}`);
    await whenInteractive(this.page.getByRole("button", { name: "Save this session" }));
  }

  async fill(options: { strength: string; comfort: number; skinA: string; skinB: string; photo?: { name: string; mimeType: string; buffer: Buffer } }) {
    const page = this.page;
    // After a change nobody has confirmed yet, the log first asks which settings the stimulator had.
    const which = page.getByRole("group", { name: "Which settings was your stimulator set to?" });
    if ((await which.count()) > 0) await which.getByRole("radio", { name: /^The new settings/ }).check();
    await page.getByLabel(/^Channel 1 \(.*\), in mA/).fill(options.strength);
    await page.getByRole("group", { name: "How comfortable was it?" }).getByRole("radio", { name: new RegExp(`^${options.comfort}\\b`) }).check();
    await page.getByRole("group", { name: "Movement you saw" }).getByRole("radio", { name: "Some movement" }).check();
    await page.getByRole("group", { name: "How tired the muscles felt afterwards" }).getByRole("radio", { name: "A little tired" }).check();
    await page.getByRole("group", { name: /^Channel 1, electrode A/ }).getByRole("radio", { name: new RegExp(`^${options.skinA}`) }).check();
    const siteB = page.getByRole("group", { name: /^Channel 1, electrode B/ });
    await siteB.getByRole("radio", { name: new RegExp(`^${options.skinB}`) }).check();
    if (options.photo) {
      await siteB.getByLabel("Photo of the skin (optional, helps your therapist)").setInputFiles(options.photo);
      await siteB.getByRole("img", { name: "Photo 1" }).waitFor();
    }
    await page.getByRole("group", { name: "How the electrodes stuck" }).getByRole("radio", { name: "Fine, flat all the way round" }).check();
  }

  async save() {
    await this.page.getByRole("button", { name: "Save this session" }).click();
    await this.page.getByRole("status").filter({ hasText: "Saved" }).waitFor();
  }

  stopAlert() {
    return this.page.getByRole("alert").filter({ hasText: "Stop" });
  }
}
