import { sendHtml } from "./http-io";
import { notFoundPage } from "./mailbox-layout";
import { mailboxPage, messagePage } from "./mailbox-pages";
import type { Route } from "./router";

export const mailboxRoutes: readonly Route[] = [
  { method: "GET", pattern: /^\/$/, handle: (ctx) => sendHtml(ctx.res, 200, mailboxPage(ctx.deps.store.list())) },
  {
    method: "GET",
    pattern: /^\/messages\/([^/]+)\/?$/,
    handle(ctx) {
      const message = ctx.deps.store.get(ctx.params[0] ?? "");
      if (message) return sendHtml(ctx.res, 200, messagePage(message));
      sendHtml(ctx.res, 404, notFoundPage("No message with that id is in the mailbox. It may have been cleared."));
    },
  },
];
