import type { IncomingMessage, ServerResponse } from "node:http";
import { HttpError, sendError } from "./http-io";
import type { MessageStore } from "./store";

export interface AppDeps {
  store: MessageStore;
  apiKey: string;
  maxBodyBytes: number;
  now: () => Date;
  log: (line: string) => void;
}

export interface RouteContext {
  req: IncomingMessage;
  res: ServerResponse;
  url: URL;
  /** Decoded capture groups of the route's pattern. */
  params: string[];
  deps: AppDeps;
}

export interface Route {
  method: "GET" | "POST" | "DELETE";
  pattern: RegExp;
  handle(ctx: RouteContext): Promise<void> | void;
}

export async function dispatch(routes: readonly Route[], ctx: Omit<RouteContext, "params">): Promise<void> {
  const matching = routes
    .map((route) => ({ route, match: route.pattern.exec(ctx.url.pathname) }))
    .filter((entry) => entry.match !== null);
  const method = ctx.req.method === "HEAD" ? "GET" : ctx.req.method;
  const hit = matching.find((entry) => entry.route.method === method);

  if (!hit?.match) {
    if (matching.length > 0) {
      const allow = [...new Set(matching.map((entry) => entry.route.method))].join(", ");
      sendError(ctx.res, new HttpError(405, "method_not_allowed", `${ctx.req.method} is not supported here; use ${allow}.`), { allow });
    } else {
      sendError(ctx.res, new HttpError(404, "not_found", `Nothing is served at ${ctx.url.pathname}.`));
    }
    return;
  }

  let params: string[];
  try {
    params = hit.match.slice(1).map((part) => decodeURIComponent(part ?? ""));
  } catch {
    sendError(ctx.res, new HttpError(400, "validation_error", "The address contains a malformed %-escape."));
    return;
  }
  await hit.route.handle({ ...ctx, params });
}
