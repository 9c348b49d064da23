import "server-only";
import { insertAuditEvent } from "@/db/queries/audit";
import { insertPhoto } from "@/db/queries/photos";
import type { Photo } from "@/db/schema";
import { inTransaction } from "@/db/transaction";
import { newStorageKey, objectStorage, type ObjectStorage } from "@/lib/storage";
import type { PhotoKind } from "./photo-upload-form";
import type { ProcessedImage } from "./process-image";

export type SavePhotoInput = {
  organizationId: string;
  clientId: string;
  kind: PhotoKind;
  uploadedById: string;
  image: ProcessedImage;
};

// Best effort: a failed clean-up is logged, never allowed to hide the error that caused it.
async function removeAll(storage: ObjectStorage, keys: string[]) {
  for (const key of keys) {
    await storage.delete(key).catch((error: unknown) => console.error(`[uploads] could not remove ${key}:`, error));
  }
}

// Writes both renditions, then the row and its audit event in one transaction. The files go first so a row never
// points at a missing file; if anything after the first write fails, what was written is removed again.
export async function savePhoto(input: SavePhotoInput, storage: ObjectStorage = objectStorage()): Promise<Photo> {
  const { display, thumbnail } = input.image;
  const storageKey = newStorageKey();
  const thumbnailKey = newStorageKey();
  const written: string[] = [];
  try {
    // Each key is noted before its write: a put that fails late (a timeout after the store kept the object) still
    // gets cleaned up, and deleting a key that was never written is harmless.
    written.push(storageKey);
    await storage.put(storageKey, display.bytes, display.contentType);
    written.push(thumbnailKey);
    await storage.put(thumbnailKey, thumbnail.bytes, thumbnail.contentType);
    return await inTransaction(async (tx) => {
      const row = await insertPhoto(
        {
          organizationId: input.organizationId,
          clientId: input.clientId,
          kind: input.kind,
          uploadedById: input.uploadedById,
          contentType: display.contentType,
          width: display.width,
          height: display.height,
          bytes: display.bytes.length,
          storageKey,
          thumbnailKey,
        },
        tx,
      );
      await insertAuditEvent(
        {
          organizationId: input.organizationId,
          actorUserId: input.uploadedById,
          action: "photo.uploaded",
          entityType: "photo",
          entityId: row.id,
          clientId: input.clientId,
          after: { kind: row.kind, contentType: row.contentType, width: row.width, height: row.height, bytes: row.bytes },
        },
        tx,
      );
      return row;
    });
  } catch (error) {
    await removeAll(storage, written);
    throw error;
  }
}
