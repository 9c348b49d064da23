import { randomBytes } from "node:crypto";
import { mkdir, open, readFile, rename, rm } from "node:fs/promises";
import path from "node:path";
import { assertContentType, assertStorageKey } from "./keys";
import type { ObjectStorage, StoredObject } from "./object-storage";

// Each object is one file: a first line holding the content type, then the bytes. One file per object means a
// write is a single atomic rename, with no side file that could be left behind or disagree with it.
const NEWLINE = 0x0a;

// Resolves a key to its file, two levels down (ab/abcd…) so no folder grows to hundreds of thousands of entries.
// The key check already rules out path syntax; the prefix check is a second, independent guard against escaping.
export function localPathForKey(root: string, key: string): string {
  assertStorageKey(key);
  const resolvedRoot = path.resolve(root);
  const file = path.resolve(resolvedRoot, key.slice(0, 2), key);
  if (!file.startsWith(resolvedRoot + path.sep)) throw new Error("Refused a storage path outside the storage root.");
  return file;
}

function isMissing(error: unknown): boolean {
  return (error as NodeJS.ErrnoException | undefined)?.code === "ENOENT";
}

export function createLocalDiskStorage(root: string): ObjectStorage {
  return {
    async put(key, bytes, contentType) {
      assertContentType(contentType);
      const file = localPathForKey(root, key);
      // Owner-only permissions: these are health photos, and nothing but the app should read them.
      await mkdir(path.dirname(file), { recursive: true, mode: 0o700 });
      const temporary = path.join(path.dirname(file), `.${key}.${randomBytes(6).toString("hex")}.tmp`);
      try {
        const handle = await open(temporary, "wx", 0o600);
        try {
          await handle.writeFile(Buffer.concat([Buffer.from(`${contentType}\n`, "ascii"), bytes]));
          await handle.sync();
        } finally {
          await handle.close();
        }
        await rename(temporary, file);
      } catch (error) {
        await rm(temporary, { force: true });
        throw error;
      }
    },

    async get(key): Promise<StoredObject | null> {
      const file = localPathForKey(root, key);
      let raw: Buffer;
      try {
        raw = await readFile(file);
      } catch (error) {
        if (isMissing(error)) return null;
        throw error;
      }
      const end = raw.indexOf(NEWLINE);
      if (end <= 0) throw new Error(`The stored object ${key} has no content type line.`);
      return { contentType: raw.subarray(0, end).toString("ascii"), bytes: raw.subarray(end + 1) };
    },

    async delete(key) {
      await rm(localPathForKey(root, key), { force: true });
    },
  };
}
