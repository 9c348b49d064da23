import "server-only";
import { and, desc, eq, gte, lt } from "drizzle-orm";
import { db, type Database } from "../client";
import { checkIn, programmeVersion, user, type NewCheckIn } from "../schema";

export async function insertCheckIn(values: NewCheckIn, executor: Database = db()) {
  const [row] = await executor.insert(checkIn).values(values).returning();
  if (!row) throw new Error("Check-in insert returned nothing.");
  return row;
}

export async function getLatestCheckInByClientId(clientId: string, executor: Database = db()) {
  const [row] = await executor.select().from(checkIn).where(eq(checkIn.clientId, clientId)).orderBy(desc(checkIn.createdAt)).limit(1);
  return row ?? null;
}

export async function getCheckInById(checkInId: string) {
  const [row] = await db()
    .select({ checkIn, loggedByName: user.name, versionNumber: programmeVersion.number })
    .from(checkIn)
    .innerJoin(user, eq(checkIn.loggedById, user.id))
    .leftJoin(programmeVersion, eq(checkIn.programmeVersionId, programmeVersion.id))
    .where(eq(checkIn.id, checkInId))
    .limit(1);
  return row ?? null;
}

export async function listCheckInsByClientId(clientId: string, options: { from?: string; before?: string; limit?: number } = {}) {
  const conditions = [eq(checkIn.clientId, clientId)];
  if (options.from) conditions.push(gte(checkIn.sessionDate, options.from));
  if (options.before) conditions.push(lt(checkIn.sessionDate, options.before));
  return db()
    .select({ checkIn, loggedByName: user.name, versionNumber: programmeVersion.number })
    .from(checkIn)
    .innerJoin(user, eq(checkIn.loggedById, user.id))
    .leftJoin(programmeVersion, eq(checkIn.programmeVersionId, programmeVersion.id))
    .where(and(...conditions))
    .orderBy(desc(checkIn.sessionDate), desc(checkIn.createdAt))
    .limit(options.limit ?? 500);
}
