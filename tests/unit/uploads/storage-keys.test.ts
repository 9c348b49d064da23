import { mkdtemp, readdir, rm, stat } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { assertContentType, isStorageKey, newStorageKey } from "@/lib/storage/keys";
import { createLocalDiskStorage, localPathForKey } from "@/lib/storage/local-disk-storage";

const root = await mkdtemp(path.join(tmpdir(), "rampline-storage-"));
afterAll(() => rm(root, { recursive: true, force: true }));

async function filesUnder(folder: string): Promise<string[]> {
  const entries = await readdir(folder, { recursive: true, withFileTypes: true });
  return entries.filter((entry) => entry.isFile()).map((entry) => path.join(entry.parentPath, entry.name));
}

const HOSTILE_KEYS = [
  "",
  ".",
  "..",
  "../../etc/passwd",
  "..%2f..%2fetc%2fpasswd",
  "/etc/passwd",
  "ab/cdef0123456789abcdef0123456789",
  "C:\\Windows\\win.ini",
  "0123456789abcdef0123456789abcdef\u0000.jpg",
  "0123456789abcdef0123456789abcde", // one character short
  "0123456789ABCDEF0123456789ABCDEF", // upper case is not what newStorageKey makes
  "photo.jpg",
];

describe("storage keys", () => {
  it("are 128-bit random hex and do not repeat", () => {
    const keys = new Set(Array.from({ length: 1000 }, newStorageKey));
    expect(keys.size).toBe(1000);
    for (const key of keys) expect(key).toMatch(/^[0-9a-f]{32}$/);
    expect([...keys].every(isStorageKey)).toBe(true);
  });

  it("refuse anything with path syntax or not made by newStorageKey", () => {
    for (const key of HOSTILE_KEYS) {
      expect(isStorageKey(key), JSON.stringify(key)).toBe(false);
      expect(() => localPathForKey(root, key), JSON.stringify(key)).toThrow();
    }
  });

  it("map a good key to a file two levels inside the root", () => {
    const key = newStorageKey();
    expect(localPathForKey(root, key)).toBe(path.join(root, key.slice(0, 2), key));
  });

  it("accept only a plain type/subtype as a content type", () => {
    expect(() => assertContentType("image/jpeg")).not.toThrow();
    for (const bad of ["image/jpeg\nX-Evil: 1", "", "jpeg", "image/jpeg; charset=x", "IMAGE/JPEG"]) {
      expect(() => assertContentType(bad), bad).toThrow();
    }
  });
});

describe("the local-disk store", () => {
  const storage = createLocalDiskStorage(root);

  it("round-trips bytes and content type, creating folders as needed", async () => {
    const key = newStorageKey();
    const bytes = Buffer.from([0, 1, 2, 10, 13, 255]); // includes a newline byte: only the first line is the header
    await storage.put(key, bytes, "image/jpeg");
    const stored = await storage.get(key);
    expect(stored?.contentType).toBe("image/jpeg");
    expect(stored && Buffer.compare(stored.bytes, bytes)).toBe(0);
    // Owner-only: other accounts on the machine cannot read a health photo.
    expect((await stat(localPathForKey(root, key))).mode & 0o777).toBe(0o600);
  });

  it("answers null for a key with nothing stored, and deleting twice is fine", async () => {
    const key = newStorageKey();
    expect(await storage.get(key)).toBeNull();
    await storage.put(key, Buffer.from("x"), "text/plain");
    await storage.delete(key);
    await storage.delete(key);
    expect(await storage.get(key)).toBeNull();
  });

  it("writes nothing at all for a hostile key or a bad content type", async () => {
    const before = await filesUnder(root);
    for (const key of HOSTILE_KEYS) await expect(storage.put(key, Buffer.from("x"), "image/png")).rejects.toThrow();
    await expect(storage.put(newStorageKey(), Buffer.from("x"), "image/png\r\n")).rejects.toThrow();
    expect(await filesUnder(root)).toEqual(before);
  });

  it("cannot be led outside its root by a key that climbs out", async () => {
    const escapee = `escaped-${newStorageKey()}`;
    await expect(storage.put(`../${escapee}`, Buffer.from("x"), "image/png")).rejects.toThrow();
    await expect(storage.put(`ab/../../${escapee}`, Buffer.from("x"), "image/png")).rejects.toThrow();
    await expect(stat(path.join(path.dirname(root), escapee))).rejects.toMatchObject({ code: "ENOENT" });
  });
});
