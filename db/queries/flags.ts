import "server-only";
import { and, asc, count, desc, eq, inArray, ne, sql } from "drizzle-orm";
import { db, type Database } from "../client";
import { client, flag, type NewFlag } from "../schema";

export async function insertFlags(values: NewFlag[], executor: Database = db()) {
  if (values.length === 0) return [];
  return executor.insert(flag).values(values).returning();
}

export async function listFlagsByClientId(clientId: string) {
  return db().select().from(flag).where(eq(flag.clientId, clientId)).orderBy(desc(flag.createdAt));
}

export async function listUnresolvedFlagsByOrganizationId(organizationId: string) {
  return db()
    .select({ flag, clientName: client.fullName, primaryTherapistId: client.primaryTherapistId })
    .from(flag)
    .innerJoin(client, eq(flag.clientId, client.id))
    .where(and(eq(flag.organizationId, organizationId), ne(flag.status, "resolved")))
    .orderBy(desc(flag.createdAt));
}

// Rules run by the daily job raise a flag only if the same rule has no flag still open for that client.
export async function hasUnresolvedFlag(clientId: string, rule: string, executor: Database = db()) {
  const [row] = await executor
    .select({ id: flag.id })
    .from(flag)
    .where(and(eq(flag.clientId, clientId), eq(flag.rule, rule), inArray(flag.status, ["open", "acknowledged"])))
    .limit(1);
  return Boolean(row);
}

export async function getFlagById(flagId: string, executor: Database = db()) {
  const [row] = await executor.select().from(flag).where(eq(flag.id, flagId)).limit(1);
  return row ?? null;
}

export async function updateFlagById(flagId: string, values: Partial<NewFlag>, executor: Database = db()) {
  const [row] = await executor.update(flag).set(values).where(eq(flag.id, flagId)).returning();
  return row ?? null;
}

export async function countOpenFlagsByTherapistId(organizationId: string, therapistId: string) {
  const [row] = await db()
    .select({ n: count() })
    .from(flag)
    .innerJoin(client, eq(flag.clientId, client.id))
    .where(and(eq(flag.organizationId, organizationId), eq(client.primaryTherapistId, therapistId), ne(flag.status, "resolved")));
  return row?.n ?? 0;
}

// The review queue: flags not yet resolved, urgent first, then oldest first.
export async function listReviewQueue(organizationId: string, therapistId: string | null) {
  const conditions = [eq(flag.organizationId, organizationId), ne(flag.status, "resolved")];
  if (therapistId) conditions.push(eq(client.primaryTherapistId, therapistId));
  return db()
    .select({ flag, clientName: client.fullName })
    .from(flag)
    .innerJoin(client, eq(flag.clientId, client.id))
    .where(and(...conditions))
    .orderBy(sql`case when ${flag.severity} = 'urgent' then 0 else 1 end`, asc(flag.createdAt));
}

export async function listResolvedFlagsByOrganizationId(organizationId: string, therapistId: string | null, limit = 20) {
  const conditions = [eq(flag.organizationId, organizationId), eq(flag.status, "resolved")];
  if (therapistId) conditions.push(eq(client.primaryTherapistId, therapistId));
  return db()
    .select({ flag, clientName: client.fullName })
    .from(flag)
    .innerJoin(client, eq(flag.clientId, client.id))
    .where(and(...conditions))
    .orderBy(desc(flag.resolvedAt))
    .limit(limit);
}
