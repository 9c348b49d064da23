import "server-only";
import { and, asc, count, eq, gt, ne, or, isNull, sql } from "drizzle-orm";
import { db, type Database } from "../client";
import { message, notificationSetting, threadRead, user, type NewMessage } from "../schema";

export async function insertMessage(values: NewMessage, executor: Database = db()) {
  const [row] = await executor.insert(message).values(values).returning();
  return row!;
}

export async function listMessagesByClientId(clientId: string) {
  return db()
    .select({ message, authorName: user.name })
    .from(message)
    .leftJoin(user, eq(message.authorId, user.id))
    .where(eq(message.clientId, clientId))
    .orderBy(asc(message.createdAt));
}

export async function markThreadReadByUser(clientId: string, userId: string, at = new Date(), executor: Database = db()) {
  await executor
    .insert(threadRead)
    .values({ clientId, userId, lastReadAt: at })
    .onConflictDoUpdate({ target: [threadRead.clientId, threadRead.userId], set: { lastReadAt: sql`greatest(${threadRead.lastReadAt}, ${at})` } });
}

export async function getThreadReadByUser(clientId: string, userId: string, executor: Database = db()) {
  const [row] = await executor.select().from(threadRead).where(and(eq(threadRead.clientId, clientId), eq(threadRead.userId, userId))).limit(1);
  return row ?? null;
}

export async function setLastNotifiedAt(clientId: string, userId: string, at: Date, executor: Database = db()) {
  await executor
    .insert(threadRead)
    .values({ clientId, userId, lastReadAt: new Date(0), lastNotifiedAt: at })
    .onConflictDoUpdate({ target: [threadRead.clientId, threadRead.userId], set: { lastNotifiedAt: at } });
}

// Messages by others after a moment (the person's last read or last notification).
export async function countMessagesAfter(clientId: string, userId: string, after: Date | null, executor: Database = db()) {
  const [row] = await executor
    .select({ n: count() })
    .from(message)
    .where(and(eq(message.clientId, clientId), or(isNull(message.authorId), ne(message.authorId, userId)), after ? gt(message.createdAt, after) : undefined));
  return row?.n ?? 0;
}

export async function getNotificationSettingByUserId(userId: string) {
  const [row] = await db().select().from(notificationSetting).where(eq(notificationSetting.userId, userId)).limit(1);
  return row ?? { userId, emailMessages: true, emailProgrammeUpdates: true, emailFlags: true };
}

export async function upsertNotificationSetting(userId: string, values: { emailMessages: boolean; emailProgrammeUpdates: boolean; emailFlags: boolean }) {
  await db().insert(notificationSetting).values({ userId, ...values }).onConflictDoUpdate({ target: notificationSetting.userId, set: values });
}

// Messages by others that this person has not read, over the threads given (their own, or their caseload's).
export async function countUnreadForUser(userId: string, clientIds: string[]) {
  if (clientIds.length === 0) return 0;
  const result = await db().execute<{ n: number }>(sql`
    SELECT count(*)::int AS n FROM message m
    LEFT JOIN thread_read r ON r.client_id = m.client_id AND r.user_id = ${userId}
    WHERE m.client_id IN (${sql.join(clientIds.map((id) => sql`${id}`), sql`, `)})
      AND (m.author_id IS NULL OR m.author_id <> ${userId})
      AND (r.last_read_at IS NULL OR m.created_at > r.last_read_at)`);
  return result.rows[0]?.n ?? 0;
}
