import "server-only";
import { getPhotoById } from "@/db/queries/photos";
import type { Client } from "@/db/schema";
import type { ProgrammeContent } from "@/lib/programmes/content";
import { objectStorage, type ObjectStorage } from "@/lib/storage";
import { MAX_PHOTOS_PER_CHANNEL, type HandoutPhoto } from "./handout-photo";

const FORMATS: Record<string, HandoutPhoto["format"]> = { "image/jpeg": "jpg", "image/png": "png" };

// The placement photos the handout prints, read straight from private storage: the PDF is built on the server, so
// no photo ever needs a URL that could be fetched without the access check. Only photos of this client are used,
// whatever ids the content holds. A photo that cannot be read is left out and logged; the handout still prints,
// and says a photo is missing.
export async function loadHandoutPhotos(
  client: Pick<Client, "id" | "organizationId">,
  content: ProgrammeContent,
  storage: ObjectStorage = objectStorage(),
): Promise<Map<string, HandoutPhoto>> {
  const ids = [...new Set(content.channels.flatMap((channel) => channel.photoIds.slice(0, MAX_PHOTOS_PER_CHANNEL)))];
  const found = await Promise.all(ids.map((id) => loadOne(client, id, storage)));
  return new Map(found.filter((entry): entry is [string, HandoutPhoto] => entry !== null));
}

async function loadOne(client: Pick<Client, "id" | "organizationId">, id: string, storage: ObjectStorage): Promise<[string, HandoutPhoto] | null> {
  const row = await getPhotoById(id);
  if (!row || row.clientId !== client.id || row.organizationId !== client.organizationId) {
    console.error(`[handout-pdf] client ${client.id}'s programme names photo ${id}, which is not one of theirs`);
    return null;
  }
  const stored = await storage.get(row.storageKey);
  const format = stored ? FORMATS[stored.contentType] : undefined;
  if (!stored || !format) {
    console.error(`[handout-pdf] photo ${row.id} has no printable stored file (${stored?.contentType ?? "missing"})`);
    return null;
  }
  return [row.id, { data: stored.bytes, format, width: row.width, height: row.height }];
}
