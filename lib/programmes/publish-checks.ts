import "server-only";
import { listConsentEventsByClientId, currentConsents } from "@/db/queries/consents";
import { listPhotosByIds } from "@/db/queries/photos";
import { getPublishingGate } from "@/lib/screening/gate";
import { programmeContentSchema, type ProgrammeContent } from "./content";
import { analyseProgramme } from "./analyse";

export type PublishReadiness = { content: ProgrammeContent | null; reasons: string[] };

// Everything that stops a programme being published, in one list the builder shows and the server enforces.
export async function checkReadyToPublish(clientId: string, contentInput: unknown): Promise<PublishReadiness> {
  const reasons: string[] = [];
  const parsed = programmeContentSchema.safeParse(contentInput);
  let content: ProgrammeContent | null = null;
  if (!parsed.success) {
    for (const issue of parsed.error.issues) reasons.push(describeIssue(issue.path, issue.message));
  } else {
    content = parsed.data;
    for (const channel of analyseProgramme(content)) {
      for (const finding of channel.blocking) reasons.push(`Channel ${channel.number}: ${finding.title}.`);
    }
    reasons.push(...(await photoProblems(clientId, content)));
  }
  const gate = await getPublishingGate(clientId);
  reasons.push(...gate.reasons);
  const consents = currentConsents(await listConsentEventsByClientId(clientId));
  const treatment = consents.find((c) => c.kind === "treatment")?.event;
  if (treatment?.status !== "given") reasons.push("Record the client's consent to treatment before publishing.");
  return { content: reasons.length === 0 ? content : null, reasons: [...new Set(reasons)] };
}

// A version may only show this client's own placement photos: an id from elsewhere would leak another record.
async function photoProblems(clientId: string, content: ProgrammeContent): Promise<string[]> {
  const ids = content.channels.flatMap((channel) => channel.photoIds);
  const found = new Map((await listPhotosByIds(ids)).map((row) => [row.id, row]));
  return content.channels.flatMap((channel, index) =>
    channel.photoIds
      .filter((id) => found.get(id)?.clientId !== clientId || found.get(id)?.kind !== "placement")
      .map(() => `Channel ${index + 1}: a placement photo is missing or belongs to another record; remove it and add it again.`),
  );
}

function describeIssue(path: PropertyKey[], message: string): string {
  if (path[0] === "channels" && typeof path[1] === "number") return `Channel ${path[1] + 1}: ${message}`;
  if (path[0] === "schedule") return `Schedule: ${message}`;
  return message;
}
