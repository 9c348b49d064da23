import type { APIRequestContext, Browser } from "playwright-core";
import { publishableValues } from "../../support/programmes";
import { cleanAnswers } from "../../unit/screening/answers-fixture";
import { newContext } from "./browser";
import { APP_URL } from "./env";
import { NEW_PERSON_PASSWORD, uniqueEmail, waitForInvitationLink, type Session } from "./people";

// A new invented client with an account, consent, a clean screening and version 1 published, set up through the
// same JSON routes the screens use, for journeys that start from there.
async function call(request: APIRequestContext, method: "post" | "put", path: string, data: unknown) {
  const response = await request[method](`${APP_URL}${path}`, { data });
  if (!response.ok()) throw new Error(`${method.toUpperCase()} ${path} answered ${response.status()}: ${await response.text()}`);
  return response.json();
}

export async function readyClient(browser: Browser, therapist: Session, name: string) {
  const email = uniqueEmail("story-client");
  const { clientId } = await call(therapist.context.request, "post", "/api/clients", { fullName: name, email });
  const link = await waitForInvitationLink(email);
  const context = await newContext(browser, { viewport: { width: 390, height: 844 } });
  const accept = await context.request.post(`${APP_URL}/api/invitations/${link.split("/").pop()}/accept`, { data: { name, password: NEW_PERSON_PASSWORD, confirmPassword: NEW_PERSON_PASSWORD } });
  if (!accept.ok()) throw new Error(`Accepting the invitation answered ${accept.status()}`);
  await call(therapist.context.request, "post", `/api/clients/${clientId}/consents`, { kind: "treatment", status: "given", method: "written" });
  await call(therapist.context.request, "post", `/api/clients/${clientId}/screenings`, cleanAnswers());
  const { revision } = await call(therapist.context.request, "put", `/api/clients/${clientId}/programme/draft`, { values: publishableValues(), baseRevision: 0 });
  await call(therapist.context.request, "post", `/api/clients/${clientId}/programme/versions`, { reason: "First programme", baseRevision: revision });
  const page = await context.newPage();
  return { clientId: clientId as string, email, session: { context, page } as Session };
}
