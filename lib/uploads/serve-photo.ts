import "server-only";
import { getClientById } from "@/db/queries/clients";
import { getPhotoById } from "@/db/queries/photos";
import type { Actor } from "@/lib/auth/actor";
import { canAccessClient } from "@/lib/auth/access";
import { AppError, notFound } from "@/lib/errors";
import { objectStorage, type ObjectStorage } from "@/lib/storage";

export const PHOTO_SIZES = ["display", "thumb"] as const;
export type PhotoSize = (typeof PHOTO_SIZES)[number];

// Headers for the bytes of a health photo: never kept by a shared cache or the browser, never sniffed into
// something executable, shown inline rather than downloaded, and with nothing it could load or run.
export const PHOTO_RESPONSE_HEADERS = {
  "Cache-Control": "private, no-store",
  "X-Content-Type-Options": "nosniff",
  "Content-Disposition": "inline",
  "Content-Security-Policy": "default-src 'none'; sandbox",
  "Cross-Origin-Resource-Policy": "same-origin",
} as const;

function parseSize(value: string | null): PhotoSize {
  if (value === null || value === "display") return "display";
  if (value === "thumb") return "thumb";
  throw new AppError("VALIDATION", "Some fields need attention.", { size: "Ask for size=thumb, or leave size out for the full photo." });
}

// Anyone who cannot reach the photo's client, including someone not signed in, gets exactly the answer a photo
// that does not exist gets, so an id reveals nothing.
export async function photoResponse(
  actor: Actor | null,
  photoId: string,
  size: string | null,
  storage: ObjectStorage = objectStorage(),
): Promise<Response> {
  const missing = () => notFound("That photo");
  if (!actor) throw missing();
  const row = await getPhotoById(photoId);
  if (!row) throw missing();
  const owner = await getClientById(row.clientId);
  if (!owner || owner.organizationId !== row.organizationId || !canAccessClient(actor, owner)) throw missing();

  const key = parseSize(size) === "thumb" ? row.thumbnailKey : row.storageKey;
  const stored = await storage.get(key);
  if (!stored) {
    console.error(`[uploads] photo ${row.id} has no stored file for its ${size ?? "display"} rendition`);
    throw missing();
  }
  return new Response(new Uint8Array(stored.bytes), {
    status: 200,
    headers: { ...PHOTO_RESPONSE_HEADERS, "Content-Type": stored.contentType, "Content-Length": String(stored.bytes.length) },
  });
}
