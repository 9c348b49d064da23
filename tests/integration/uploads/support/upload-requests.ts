// Builds photo upload and download requests for the in-process route tests, and counts what was stored.
import { readdir, rm } from "node:fs/promises";
import path from "node:path";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { photo } from "@/db/schema";
import { env } from "@/lib/env";

const BASE = "http://127.0.0.1:3000";

type FilePart = { bytes: Uint8Array; filename?: string; type?: string };

export function uploadRequest(clientId: string, options: { cookie?: string; kind?: string; file?: FilePart | null } = {}) {
  const form = new FormData();
  if (options.kind !== undefined) form.append("kind", options.kind);
  if (options.file) {
    const { bytes, filename = "photo.jpg", type = "image/jpeg" } = options.file;
    form.append("photo", new Blob([new Uint8Array(bytes)], { type }), filename);
  }
  return new Request(`${BASE}/api/clients/${clientId}/photos`, {
    method: "POST",
    headers: { origin: BASE, ...(options.cookie ? { cookie: options.cookie } : {}) },
    body: form,
  });
}

export function photoRequest(url: string, cookie?: string) {
  return new Request(new URL(url, BASE), { headers: cookie ? { cookie } : {} });
}

export async function photoRowCount(clientId: string) {
  return (await db().select({ id: photo.id }).from(photo).where(eq(photo.clientId, clientId))).length;
}

// Every file under this test file's storage root (see useOwnStorageRoot), temporary ones included.
export async function storedFileCount() {
  const entries = await readdir(path.resolve(env().STORAGE_DIR), { recursive: true, withFileTypes: true }).catch(() => []);
  return entries.filter((entry) => entry.isFile()).length;
}

export async function storedState(clientId: string) {
  return { rows: await photoRowCount(clientId), files: await storedFileCount() };
}

export async function removeStorageRoot() {
  await rm(path.resolve(env().STORAGE_DIR), { recursive: true, force: true });
}

export type ErrorJson = { error: { code: string; message: string; fields?: Record<string, string> } };
export type UploadJson = { id: string; width: number; height: number; url: string; thumbnailUrl: string };
