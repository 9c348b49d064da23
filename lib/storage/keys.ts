import { randomBytes } from "node:crypto";

// 128 random bits as lower-case hex: unguessable, and safe as a file name or an S3 object name on any platform.
const KEY_PATTERN = /^[0-9a-f]{32}$/;

export function newStorageKey(): string {
  return randomBytes(16).toString("hex");
}

// Only keys of our own shape are accepted, so no slash, dot or other path syntax can ever reach a store.
export function isStorageKey(value: unknown): value is string {
  return typeof value === "string" && KEY_PATTERN.test(value);
}

export function assertStorageKey(value: string): void {
  if (!isStorageKey(value)) throw new Error("Refused a storage key that was not made by newStorageKey().");
}

// Content types are written beside the bytes (a header line on disk, object metadata elsewhere), so they are kept
// to a plain type/subtype with no spaces, parameters or line breaks.
const CONTENT_TYPE_PATTERN = /^[a-z0-9][a-z0-9.+-]*\/[a-z0-9][a-z0-9.+-]*$/;

export function assertContentType(value: string): void {
  if (!CONTENT_TYPE_PATTERN.test(value)) throw new Error("Refused a malformed content type for storage.");
}
