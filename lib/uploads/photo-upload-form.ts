import { z } from "zod";
import { PHOTO_KINDS } from "@/db/schema";
import { AppError, type FieldErrors } from "@/lib/errors";
import { fieldErrorsFrom } from "@/lib/validation";
import type { SingleFileForm } from "./read-single-file-form";
import { CHOOSE_A_PHOTO } from "./upload-errors";

export const PHOTO_FILE_FIELD = "photo";

// The text fields of a photo upload, shared by the upload form and the route.
export const photoUploadFieldsSchema = z.object({
  kind: z.enum(PHOTO_KINDS, { error: "Say whether the photo shows an electrode placement, the skin or a message attachment." }),
});
export type PhotoKind = (typeof PHOTO_KINDS)[number];

// Reports every missing or wrong field at once, as forms expect; a missing or empty file is the `photo` field's.
export function parsePhotoUploadForm(form: SingleFileForm): { kind: PhotoKind; file: Buffer } {
  const fields: FieldErrors = {};
  const parsed = photoUploadFieldsSchema.safeParse(form.fields);
  if (!parsed.success) Object.assign(fields, fieldErrorsFrom(parsed.error));
  if (!form.file || form.file.length === 0) fields[PHOTO_FILE_FIELD] = CHOOSE_A_PHOTO;
  if (!parsed.success || !form.file || form.file.length === 0) {
    throw new AppError("VALIDATION", fields[PHOTO_FILE_FIELD] ?? "Some fields need attention.", fields);
  }
  return { kind: parsed.data.kind, file: form.file };
}
