import type { Browser, BrowserContext, Page } from "playwright-core";
import { CaseloadPage } from "../pages/caseload-page";
import { launchBrowser, newContext } from "./browser";
import { demo } from "./demo-accounts";
import { inviteTherapistAs, signInAs, uniqueEmail, type Session } from "./people";

// The people the validation files work with: demo staff and a demo client (whom they never change, because every
// request they make is refused), plus a fresh invitation that is never accepted.
export type Cast = {
  browser: Browser;
  admin: Session;
  therapist: Session;
  client: Session;
  invitationLink: string;
  arthurPath: string;
  guestPage: () => Promise<Page>;
  track: (context: BrowserContext) => BrowserContext;
  close: () => Promise<void>;
};

export async function assembleCast(): Promise<Cast> {
  const browser = await launchBrowser();
  const contexts: BrowserContext[] = [];
  const track = (context: BrowserContext) => {
    contexts.push(context);
    return context;
  };
  const admin = await signInAs(browser, demo.admin.email, "/team");
  const therapist = await signInAs(browser, demo.therapist.email, "/caseload");
  const client = await signInAs(browser, demo.client.email, "/today");
  [admin, therapist, client].forEach((session) => track(session.context));
  const invitationLink = await inviteTherapistAs(admin.context, { name: "Ffion Gale", email: uniqueEmail("never-accepts") });
  const arthurPath = await new CaseloadPage(therapist.page).clientPagePath(demo.client.name);
  return {
    browser,
    admin,
    therapist,
    client,
    invitationLink,
    arthurPath,
    track,
    guestPage: async () => track(await newContext(browser)).newPage(),
    close: async () => {
      for (const context of contexts) await context.close();
      await browser.close();
    },
  };
}
