import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import { db, type Database } from "../client";
import { client, type NewClient } from "../schema";

export async function getClientById(clientId: string) {
  const [row] = await db().select().from(client).where(eq(client.id, clientId)).limit(1);
  return row ?? null;
}

export async function getClientByOrganizationAndEmail(organizationId: string, email: string) {
  const [row] = await db()
    .select()
    .from(client)
    .where(and(eq(client.organizationId, organizationId), eq(client.email, email)))
    .limit(1);
  return row ?? null;
}

export async function insertClient(values: NewClient, executor: Database = db()) {
  const [row] = await executor.insert(client).values(values).returning();
  if (!row) throw new Error("Client insert returned nothing.");
  return row;
}

export async function linkClientUserById(clientId: string, userId: string, executor: Database) {
  await executor.update(client).set({ userId }).where(eq(client.id, clientId));
}

export async function listCaseloadByTherapistId(organizationId: string, therapistId: string) {
  return db()
    .select({
      id: client.id,
      fullName: client.fullName,
      email: client.email,
      userId: client.userId,
      createdAt: client.createdAt,
    })
    .from(client)
    .where(and(eq(client.organizationId, organizationId), eq(client.primaryTherapistId, therapistId)))
    .orderBy(asc(client.fullName));
}

export async function updateClientDetailsById(
  clientId: string,
  values: Pick<NewClient, "condition" | "affectedSide" | "goals" | "onsetDate">,
  executor: Database = db(),
) {
  const [row] = await executor.update(client).set(values).where(eq(client.id, clientId)).returning();
  return row ?? null;
}

// One row per client for the caseload table: the programme's state, the version in force and its review date, and the
// latest screening's outcome. Subqueries keep it to one round trip however large the caseload.
export async function listCaseloadRowsByTherapistId(organizationId: string, therapistId: string) {
  const result = await db().execute<{
    id: string;
    full_name: string;
    email: string;
    has_account: boolean;
    has_draft: boolean;
    version_number: number | null;
    published_at: string | null;
    review_on: string | null;
    screening_outcome: string | null;
  }>(sql`
    SELECT c.id, c.full_name, c.email, (c.user_id IS NOT NULL) AS has_account,
      (p.draft IS NOT NULL) AS has_draft,
      v.number AS version_number, v.published_at, v.content->'schedule'->>'reviewOn' AS review_on,
      s.outcome AS screening_outcome
    FROM client c
    LEFT JOIN programme p ON p.client_id = c.id
    LEFT JOIN LATERAL (
      SELECT number, published_at, content FROM programme_version pv WHERE pv.programme_id = p.id ORDER BY number DESC LIMIT 1
    ) v ON true
    LEFT JOIN LATERAL (
      SELECT outcome FROM screening sc WHERE sc.client_id = c.id ORDER BY version DESC LIMIT 1
    ) s ON true
    WHERE c.organization_id = ${organizationId} AND c.primary_therapist_id = ${therapistId}
    ORDER BY c.full_name`);
  return result.rows.map((row) => ({
    id: row.id,
    fullName: row.full_name,
    email: row.email,
    hasAccount: row.has_account,
    hasDraft: row.has_draft,
    versionNumber: row.version_number,
    publishedAt: row.published_at,
    reviewOn: row.review_on,
    screeningOutcome: row.screening_outcome,
  }));
}
export type CaseloadRow = Awaited<ReturnType<typeof listCaseloadRowsByTherapistId>>[number];

export async function listClientsByOrganizationId(organizationId: string) {
  return db().select({ id: client.id, fullName: client.fullName }).from(client).where(eq(client.organizationId, organizationId)).orderBy(asc(client.fullName));
}

export async function listClientIdsByTherapistId(organizationId: string, therapistId: string) {
  const rows = await db().select({ id: client.id }).from(client).where(and(eq(client.organizationId, organizationId), eq(client.primaryTherapistId, therapistId)));
  return rows.map((row) => row.id);
}
