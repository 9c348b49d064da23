import "server-only";
import path from "node:path";
import { env } from "@/lib/env";
import { createLocalDiskStorage } from "./local-disk-storage";
import type { ObjectStorage } from "./object-storage";

export { newStorageKey, isStorageKey } from "./keys";
export type { ObjectStorage, StoredObject } from "./object-storage";

let cached: ObjectStorage | undefined;

// The one place that decides where private files live. Today that is the local disk under STORAGE_DIR; an
// S3-compatible store would be another ObjectStorage chosen here from a setting in lib/env.ts, and nothing that
// calls objectStorage() would change.
export function objectStorage(): ObjectStorage {
  cached ??= createLocalDiskStorage(path.resolve(env().STORAGE_DIR));
  return cached;
}
