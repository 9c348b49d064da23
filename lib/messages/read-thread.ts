import "server-only";
import { getThreadReadByUser, listMessagesByClientId, markThreadReadByUser } from "@/db/queries/messages";
import type { Actor } from "@/lib/auth/actor";
import { requireClientAccess } from "@/lib/auth/access";

export type ThreadMessage = {
  id: string;
  kind: "message" | "system";
  body: string;
  authorName: string | null;
  mine: boolean;
  photoIds: string[];
  about: { type: "check-in" | "flag" | "version"; id: string } | null;
  createdAt: string;
};

export async function readThread(actor: Actor, clientId: string) {
  const { client } = await requireClientAccess(actor, clientId);
  const [rows, read] = await Promise.all([listMessagesByClientId(client.id), getThreadReadByUser(client.id, actor.userId)]);
  const messages: ThreadMessage[] = rows.map(({ message, authorName }) => ({
    id: message.id,
    kind: message.kind,
    body: message.body,
    authorName,
    mine: message.authorId === actor.userId,
    photoIds: message.photoIds,
    about: message.aboutType && message.aboutId ? { type: message.aboutType, id: message.aboutId } : null,
    createdAt: message.createdAt.toISOString(),
  }));
  return { messages, lastReadAt: read?.lastReadAt.toISOString() ?? null };
}

export async function markThreadRead(actor: Actor, clientId: string) {
  const { client } = await requireClientAccess(actor, clientId);
  await markThreadReadByUser(client.id, actor.userId);
  return { ok: true };
}
