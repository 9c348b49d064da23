import { addressOf } from "./email-schema";
import { HttpError, sendJson } from "./http-io";
import { extractLinks } from "./html-text";
import type { Route, RouteContext } from "./router";
import type { StoredMessage } from "./store-schema";

// These routes are for tests and need no key, like the mailbox pages: the fake listens on loopback only by default.

export type InspectedMessage = StoredMessage & { links: string[] };

const inspect = (message: StoredMessage): InspectedMessage => ({
  ...message,
  links: extractLinks(message.html, message.text),
});

// A person receives a copy whether they were in To, Cc or Bcc, so the filter looks at all three.
function receivedBy(message: StoredMessage, address: string): boolean {
  return [...message.to, ...message.cc, ...message.bcc].some((recipient) => addressOf(recipient) === address);
}

function listMessages(ctx: RouteContext): void {
  const to = ctx.url.searchParams.get("to");
  let messages = ctx.deps.store.list();
  if (to !== null) {
    const address = addressOf(to);
    if (address === null) throw new HttpError(422, "validation_error", `"${to}" is not an e-mail address.`);
    messages = messages.filter((message) => receivedBy(message, address));
  }
  sendJson(ctx.res, 200, { messages: messages.map(inspect) });
}

function getMessage(ctx: RouteContext): void {
  const message = ctx.deps.store.get(ctx.params[0] ?? "");
  if (!message) throw new HttpError(404, "not_found", `No e-mail with id ${ctx.params[0] ?? ""} has been received.`);
  sendJson(ctx.res, 200, inspect(message));
}

async function clearMessages(ctx: RouteContext): Promise<void> {
  const deleted = await ctx.deps.store.clear();
  ctx.deps.log(`mailbox cleared (${deleted} deleted)`);
  sendJson(ctx.res, 200, { deleted });
}

function health(ctx: RouteContext): void {
  sendJson(ctx.res, 200, { status: "ok", messages: ctx.deps.store.list().length });
}

export const inspectRoutes: readonly Route[] = [
  { method: "GET", pattern: /^\/api\/messages\/?$/, handle: listMessages },
  { method: "DELETE", pattern: /^\/api\/messages\/?$/, handle: clearMessages },
  { method: "GET", pattern: /^\/api\/messages\/([^/]+)\/?$/, handle: getMessage },
  { method: "GET", pattern: /^\/health\/?$/, handle: health },
];
