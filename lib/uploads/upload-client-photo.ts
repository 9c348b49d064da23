import "server-only";
import type { Actor } from "@/lib/auth/actor";
import { requireClientAccess } from "@/lib/auth/access";
import type { ObjectStorage } from "@/lib/storage";
import { MAX_UPLOAD_BYTES } from "./limits";
import { requirePhotoKindAllowed } from "./photo-permissions";
import { PHOTO_FILE_FIELD, parsePhotoUploadForm } from "./photo-upload-form";
import { photoThumbnailUrl, photoUrl } from "./photo-urls";
import { processImage, type ProcessImageOptions } from "./process-image";
import { readSingleFileForm } from "./read-single-file-form";
import { savePhoto } from "./save-photo";

export type UploadClientPhotoOptions = ProcessImageOptions & { maxBytes?: number; storage?: ObjectStorage };
export type UploadedPhoto = { id: string; width: number; height: number; url: string; thumbnailUrl: string };

// Receives one photo for a client: who may reach the client (404 otherwise), the form (415/413/400), who may add
// this kind (403), then the content itself (415/413/400). Nothing is written until every check has passed.
export async function uploadClientPhoto(
  actor: Actor,
  clientId: string,
  request: Request,
  options: UploadClientPhotoOptions = {},
): Promise<UploadedPhoto> {
  const { client } = await requireClientAccess(actor, clientId);
  const form = await readSingleFileForm(request, { fileField: PHOTO_FILE_FIELD, maxFileBytes: options.maxBytes ?? MAX_UPLOAD_BYTES });
  const { kind, file } = parsePhotoUploadForm(form);
  requirePhotoKindAllowed(actor.role, kind);
  const image = await processImage(file, options);
  const row = await savePhoto(
    { organizationId: client.organizationId, clientId: client.id, kind, uploadedById: actor.userId, image },
    options.storage,
  );
  return { id: row.id, width: row.width, height: row.height, url: photoUrl(row.id), thumbnailUrl: photoThumbnailUrl(row.id) };
}
