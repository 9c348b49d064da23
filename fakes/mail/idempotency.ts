import { createHash } from "node:crypto";
import type { IncomingMessage } from "node:http";
import { HttpError } from "./http-io";
import type { IdempotencyScope } from "./store-schema";
import type { MessageStore } from "./store";

export const IDEMPOTENCY_TTL_MS = 24 * 60 * 60 * 1000;
const MAX_KEY_LENGTH = 256;

// Key order is normalised so that the same payload built in a different order still counts as the same request.
function canonical(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(canonical);
  if (value && typeof value === "object") {
    return Object.fromEntries(
      Object.entries(value as Record<string, unknown>)
        .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
        .map(([key, inner]) => [key, canonical(inner)]),
    );
  }
  return value;
}

export function fingerprintOf(payload: unknown): string {
  return createHash("sha256").update(JSON.stringify(canonical(payload))).digest("hex");
}

/** The key from the Idempotency-Key header, null when none was sent; throws when the key is unusable. */
export function idempotencyKeyOf(req: IncomingMessage): string | null {
  const header = req.headers["idempotency-key"];
  if (header === undefined) return null;
  const key = Array.isArray(header) ? header.join(",") : header;
  if (key.length < 1 || key.length > MAX_KEY_LENGTH) {
    throw new HttpError(400, "invalid_idempotency_key", `The Idempotency-Key header must be 1 to ${MAX_KEY_LENGTH} characters long.`);
  }
  return key;
}

export type Replay = { kind: "new" } | { kind: "replay"; response: unknown };

/**
 * Decides what a keyed request should do. Only successful requests are remembered, so a request that failed
 * validation can be corrected and retried with the same key.
 */
export function checkIdempotency(store: MessageStore, scope: IdempotencyScope, key: string | null, fingerprint: string): Replay {
  if (key === null) return { kind: "new" };
  const record = store.findIdempotency(scope, key);
  if (!record) return { kind: "new" };
  if (record.fingerprint !== fingerprint) {
    throw new HttpError(
      409,
      "invalid_idempotent_request",
      "This Idempotency-Key was already used with a different payload in the last 24 hours. Use a new key for a different e-mail.",
    );
  }
  return { kind: "replay", response: record.response };
}
