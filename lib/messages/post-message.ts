import "server-only";
import { insertAuditEvent } from "@/db/queries/audit";
import { listThreadMembersByClientId } from "@/db/queries/client-circle";
import { insertMessage, markThreadReadByUser } from "@/db/queries/messages";
import { getCheckInById } from "@/db/queries/check-ins";
import { getFlagById } from "@/db/queries/flags";
import { listPhotosByIds } from "@/db/queries/photos";
import { getProgrammeByClientId, getProgrammeVersionById } from "@/db/queries/programmes";
import { inTransaction, type Transaction, type JobExecutor } from "@/db/transaction";
import type { Actor } from "@/lib/auth/actor";
import { requireClientAccess } from "@/lib/auth/access";
import { AppError, forbidden } from "@/lib/errors";
import { parseInput } from "@/lib/validation";
import { queueMessageNotification } from "./notify";
import { postMessageSchema, type PostMessageInput } from "./schema";

// Writes a message (or a system message) and asks for a coalesced e-mail to everyone else in the thread.
export async function addToThread(
  tx: Transaction,
  jobs: JobExecutor,
  values: { clientId: string; authorId: string | null; kind: "message" | "system"; body: string; photoIds?: string[]; about?: { type: "check-in" | "flag" | "version"; id: string } },
) {
  const row = await insertMessage(
    { clientId: values.clientId, authorId: values.authorId, kind: values.kind, body: values.body, photoIds: values.photoIds ?? [], aboutType: values.about?.type ?? null, aboutId: values.about?.id ?? null },
    tx,
  );
  if (values.authorId) await markThreadReadByUser(values.clientId, values.authorId, row.createdAt, tx);
  for (const member of await listThreadMembersByClientId(values.clientId, tx)) {
    if (member.id !== values.authorId) await queueMessageNotification({ clientId: values.clientId, userId: member.id }, jobs);
  }
  return row;
}

// A message may only point at this client's own logs, flags and versions.
async function aboutBelongsTo(about: { type: "check-in" | "flag" | "version"; id: string }, clientId: string): Promise<boolean> {
  if (about.type === "check-in") return (await getCheckInById(about.id))?.checkIn.clientId === clientId;
  if (about.type === "flag") return (await getFlagById(about.id))?.clientId === clientId;
  const version = await getProgrammeVersionById(about.id);
  return version !== null && (await getProgrammeByClientId(clientId))?.id === version.programmeId;
}

export async function postMessage(actor: Actor, clientId: string, input: PostMessageInput) {
  if (actor.role === "admin") throw forbidden();
  const { client } = await requireClientAccess(actor, clientId);
  const data = parseInput(postMessageSchema, input);
  const photos = await listPhotosByIds(data.photoIds);
  if (photos.length !== new Set(data.photoIds).size || photos.some((photo) => photo.clientId !== client.id)) {
    throw new AppError("VALIDATION", "Some fields need attention.", { photoIds: "A photo could not be found. Attach it again." });
  }
  if (data.about && !(await aboutBelongsTo(data.about, client.id))) {
    throw new AppError("VALIDATION", "Some fields need attention.", { about: "That report is not in this client's record." });
  }
  return inTransaction(async (tx, jobs) => {
    const row = await addToThread(tx, jobs, { clientId: client.id, authorId: actor.userId, kind: "message", body: data.body, photoIds: data.photoIds, about: data.about });
    await insertAuditEvent(
      { organizationId: client.organizationId, actorUserId: actor.userId, action: "message.posted", entityType: "message", entityId: row.id, clientId: client.id, after: { about: data.about ?? null, photos: data.photoIds.length } },
      tx,
    );
    return { messageId: row.id, createdAt: row.createdAt };
  });
}
