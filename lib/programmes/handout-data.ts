import "server-only";
import { getClinicById } from "@/db/queries/clinics";
import { getProgrammeByClientId, listVersionsByProgrammeId } from "@/db/queries/programmes";
import type { Client } from "@/db/schema";
import type { HandoutProps } from "@/components/handout/handout-document";
import type { ProgrammeContent } from "./content";

// Everything the handout (page and PDF) shows for a client's version in force; null when nothing is published.
export async function getHandoutData(client: Client): Promise<HandoutProps | null> {
  const programme = await getProgrammeByClientId(client.id);
  if (!programme) return null;
  const [latest] = await listVersionsByProgrammeId(programme.id);
  if (!latest) return null;
  const clinic = await getClinicById(client.organizationId);
  return {
    clientName: client.fullName,
    clinicName: clinic?.name ?? "Your clinic",
    contact: clinic?.contact ?? {},
    versionNumber: latest.version.number,
    publishedAt: latest.version.publishedAt,
    therapistName: latest.authorName,
    content: latest.version.content as ProgrammeContent,
  };
}
