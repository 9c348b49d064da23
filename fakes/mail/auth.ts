import { createHash, timingSafeEqual } from "node:crypto";
import type { IncomingMessage } from "node:http";
import { HttpError } from "./http-io";

const digest = (value: string) => createHash("sha256").update(value).digest();

/**
 * Returns the refusal to send, or null when the request may proceed. The status codes follow the hosted service:
 * 401 when no key is presented, 403 when the key is wrong.
 */
export function checkApiKey(req: IncomingMessage, apiKey: string): HttpError | null {
  const header = req.headers.authorization;
  if (!header) {
    return new HttpError(401, "missing_api_key", "No API key was sent. Add the header `Authorization: Bearer <key>`.");
  }
  const match = /^Bearer\s+(\S+)\s*$/i.exec(header);
  // Comparing digests keeps the comparison constant-time even when the lengths differ.
  if (!match?.[1] || !timingSafeEqual(digest(match[1]), digest(apiKey))) {
    return new HttpError(403, "invalid_api_key", "The API key is not the one this mail fake was started with.");
  }
  // The hosted service refuses requests without a User-Agent; refusing them here too stops a hand-rolled client
  // passing locally and failing in production.
  if (!req.headers["user-agent"]) {
    return new HttpError(403, "validation_error", "Requests must include a User-Agent header.");
  }
  return null;
}
