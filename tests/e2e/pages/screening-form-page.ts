import type { Locator, Page } from "playwright-core";

// The screening checklist (/clients/:id/screening/new), found by role and label.
export class ScreeningFormPage {
  readonly form: Locator;

  constructor(private readonly page: Page) {
    this.form = page.getByRole("form", { name: "Screening checklist" });
  }

  question(name: string | RegExp, within: Locator = this.form) {
    return within.getByRole("group", { name, exact: typeof name === "string" });
  }

  async answer(question: string | RegExp, option: string, within?: Locator) {
    await this.question(question, within).getByRole("radio", { name: option, exact: true }).check();
  }

  site(number: number) {
    return this.form.getByRole("group", { name: new RegExp(`^Site ${number}\\b`) });
  }

  signButton() {
    return this.form.getByRole("button", { name: /^Sign screening as / });
  }

  errorOf(question: string) {
    return this.question(question).locator("p").filter({ hasText: "Error:" });
  }

  // Invented answers: one site, no red flags, no concerns.
  async fillClean(options: { pacemaker?: boolean; site?: string; rescreenOn: string }) {
    await this.page.getByLabel("Diagnosis", { exact: true }).fill("Stroke, left hemisphere");
    await this.answer("Which side is affected?", "Right");
    await this.page.getByLabel("Time since onset", { exact: true }).fill("about 8 months");
    await this.answer("Who will apply the electrodes at home?", "The client");
    await this.answer("Was a carer present at this screening?", "No");
    await this.answer(/pacemaker/, options.pacemaker ? "Yes" : "No");
    for (const flag of [/epilepsy/, /pregnant/, /unstable heart disease/, /reliably/]) await this.answer(flag, "No");
    const site = this.site(1);
    await site.getByLabel("Site name", { exact: true }).fill(options.site ?? "Right wrist and finger extensors");
    await this.answer("Is the skin at this site intact?", "Yes", site);
    await this.answer("How did you test sensation?", "Sharp and blunt", site);
    await this.answer("What did the sensation test show?", "Intact", site);
    for (const question of [/blood clot/, /malignancy/, /fracture or surgery/, /swollen/, /metalwork/]) await this.answer(question, "No", site);
    await this.answer(/front of the neck and the chest/, "Yes", site);
    await this.answer(/understand how to use the stimulator/, "Yes");
    await this.answer(/dexterity/, "Yes");
    await this.answer("Which best describes the carer?", "No carer is involved");
    await this.answer("Was a test stimulation done in clinic?", "Yes");
    await this.answer("How well was it tolerated?", "Comfortable");
    await this.answer("What movement did it produce?", "Clear movement in the intended direction");
    await this.answer("How did the skin look 10–20 minutes afterwards?", "Faint pinkness within the electrode outline");
    await this.answer("Outcome of this screening", "Eligible");
    await this.page.getByLabel("Screen again by", { exact: true }).fill(options.rescreenOn);
  }
}
