import type { Role } from "@/lib/auth/roles";
import { ROLES } from "@/lib/auth/roles";
import { AppError } from "@/lib/errors";
import type { PhotoKind } from "./photo-upload-form";

// Who may add each kind of photo, once they can reach the client at all (lib/auth/access.ts decides that).
// Placement photos are part of the programme the therapist writes; skin and message photos come from anyone in
// the client's circle or their clinic.
export const PHOTO_UPLOADERS: Record<PhotoKind, readonly Role[]> = {
  placement: ["therapist"],
  skin: ROLES,
  message: ROLES,
};

export function requirePhotoKindAllowed(role: Role, kind: PhotoKind): void {
  if (PHOTO_UPLOADERS[kind].includes(role)) return;
  throw new AppError(
    "FORBIDDEN",
    kind === "placement" ? "Only a therapist can add electrode placement photos." : "Your role does not allow adding this kind of photo.",
  );
}
