import "server-only";
import { and, eq, isNotNull, isNull, sql } from "drizzle-orm";
import { db, type Database } from "../client";
import { carerLink, client, user } from "../schema";

// The people who receive a client's updates: the client (once they have an account) and their active carers.
export async function listCircleRecipientsByClientId(clientId: string, executor: Database = db()) {
  const clientRows = await executor
    .select({ id: user.id, name: user.name, email: user.email })
    .from(client)
    .innerJoin(user, eq(client.userId, user.id))
    .where(eq(client.id, clientId));
  const carerRows = await executor
    .select({ id: user.id, name: user.name, email: user.email })
    .from(carerLink)
    .innerJoin(user, eq(carerLink.carerUserId, user.id))
    .where(and(eq(carerLink.clientId, clientId), isNull(carerLink.endedAt), isNotNull(carerLink.carerUserId)));
  return [...clientRows, ...carerRows];
}

// Everyone in a client's thread who can be notified: the client, active carers, the primary therapist and any
// other staff who have written in the thread.
export async function listThreadMembersByClientId(clientId: string, executor: Database = db()) {
  const result = await executor.execute<{ id: string; name: string; email: string }>(sql`
    SELECT DISTINCT u.id, u.name, u.email FROM "user" u WHERE u.banned IS NOT TRUE AND u.id IN (
      SELECT user_id FROM client WHERE id = ${clientId} AND user_id IS NOT NULL
      UNION SELECT carer_user_id FROM carer_link WHERE client_id = ${clientId} AND ended_at IS NULL AND carer_user_id IS NOT NULL
      UNION SELECT primary_therapist_id FROM client WHERE id = ${clientId}
      UNION SELECT m.author_id FROM message m JOIN member mb ON mb.user_id = m.author_id AND mb.role IN ('therapist', 'admin')
        WHERE m.client_id = ${clientId}
    )`);
  return result.rows;
}
