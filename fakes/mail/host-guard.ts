import type { IncomingMessage } from "node:http";
import { isLoopbackHost } from "./config";
import { HttpError } from "./http-io";

function hostnameOf(hostHeader: string): string {
  const bracketed = /^\[([^\]]+)\]/.exec(hostHeader);
  if (bracketed?.[1]) return bracketed[1];
  return hostHeader.replace(/:\d+$/, "");
}

/**
 * A web page can point its own domain's DNS at 127.0.0.1 and then read this unauthenticated mailbox (reset links
 * included) as same-origin. Such requests still carry the attacker's host name, so on a loopback bind only loopback
 * names are answered.
 */
export function checkHost(req: IncomingMessage, boundHost: string): HttpError | null {
  if (!isLoopbackHost(boundHost)) return null;
  const hostname = hostnameOf(req.headers.host ?? "").toLowerCase();
  if (isLoopbackHost(hostname) || hostname.endsWith(".localhost")) return null;
  return new HttpError(
    403,
    "validation_error",
    "This mail fake only answers requests addressed to localhost, 127.0.0.1 or [::1].",
  );
}
