import "server-only";
import { getProgrammeByClientId, listVersionsByProgrammeId } from "@/db/queries/programmes";
import { listConfirmationsByVersionId } from "@/db/queries/confirmations";
import { AppError } from "@/lib/errors";
import type { ProgrammeContent } from "@/lib/programmes/content";

// A check-in is measured against the version in force, or the earlier one the client says their device still had.
export async function versionForCheckIn(clientId: string, versionNumber?: number) {
  const programme = await getProgrammeByClientId(clientId);
  const versions = programme ? await listVersionsByProgrammeId(programme.id) : [];
  const current = versions[0];
  if (!current) throw new AppError("BLOCKED", "There is no programme to log a session against yet.", undefined, ["Your therapist has not published a programme yet."]);
  // Until the new version is confirmed on the stimulator, the client must say which settings they used.
  if (versionNumber === undefined && versions.length > 1 && (await listConfirmationsByVersionId(current.version.id)).length === 0) {
    throw new AppError("VALIDATION", "Some fields need attention.", { versionNumber: "Say which settings your stimulator was set to." });
  }
  const chosen = versionNumber === undefined ? current : versions.find((row) => row.version.number === versionNumber);
  if (!chosen) throw new AppError("VALIDATION", "Some fields need attention.", { versionNumber: "Choose one of your programme's versions." });
  return { version: chosen.version, content: chosen.version.content as ProgrammeContent, isCurrent: chosen === current };
}
