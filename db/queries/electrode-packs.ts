import "server-only";
import { and, count, desc, eq, gte } from "drizzle-orm";
import { db, type Database } from "../client";
import { checkIn, electrodePack } from "../schema";

export async function insertElectrodePack(values: typeof electrodePack.$inferInsert, executor: Database = db()) {
  const [row] = await executor.insert(electrodePack).values(values).returning();
  return row!;
}

export async function getLatestElectrodePackByClientId(clientId: string) {
  const [row] = await db().select().from(electrodePack).where(eq(electrodePack.clientId, clientId)).orderBy(desc(electrodePack.openedOn), desc(electrodePack.createdAt)).limit(1);
  return row ?? null;
}

// A use is a logged session on or after the day the pack was opened.
export async function countCheckInsSinceByClientId(clientId: string, since: string) {
  const [row] = await db().select({ n: count() }).from(checkIn).where(and(eq(checkIn.clientId, clientId), gte(checkIn.sessionDate, since)));
  return row?.n ?? 0;
}
