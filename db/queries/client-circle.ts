import "server-only";
import { and, eq, isNotNull, isNull } from "drizzle-orm";
import { db, type Database } from "../client";
import { carerLink, client, user } from "../schema";

// The people who receive a client's updates: the client (once they have an account) and their active carers.
export async function listCircleRecipientsByClientId(clientId: string, executor: Database = db()) {
  const clientRows = await executor
    .select({ name: user.name, email: user.email })
    .from(client)
    .innerJoin(user, eq(client.userId, user.id))
    .where(eq(client.id, clientId));
  const carerRows = await executor
    .select({ name: user.name, email: user.email })
    .from(carerLink)
    .innerJoin(user, eq(carerLink.carerUserId, user.id))
    .where(and(eq(carerLink.clientId, clientId), isNull(carerLink.endedAt), isNotNull(carerLink.carerUserId)));
  return [...clientRows, ...carerRows];
}
