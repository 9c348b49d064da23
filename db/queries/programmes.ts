import "server-only";
import { and, desc, eq, sql } from "drizzle-orm";
import { db, type Database } from "../client";
import { programme, programmeTemplate, programmeVersion, user } from "../schema";

export async function getProgrammeByClientId(clientId: string, executor: Database = db()) {
  const [row] = await executor.select().from(programme).where(eq(programme.clientId, clientId)).limit(1);
  return row ?? null;
}

export async function lockProgrammeByClientId(clientId: string, executor: Database) {
  const [row] = await executor.select().from(programme).where(eq(programme.clientId, clientId)).for("update").limit(1);
  return row ?? null;
}

// Creates the client's programme row if it is missing; safe when two requests race (the unique index decides).
export async function ensureProgrammeForClient(clientId: string, executor: Database = db()) {
  await executor.insert(programme).values({ clientId }).onConflictDoNothing({ target: programme.clientId });
  return (await getProgrammeByClientId(clientId, executor))!;
}

// Saves the draft only if nobody else saved since `baseRevision`; null means someone did (a conflict).
export async function updateDraftIfRevision(
  programmeId: string,
  baseRevision: number,
  draft: unknown,
  userId: string,
  executor: Database = db(),
) {
  const [row] = await executor
    .update(programme)
    .set({ draft, draftRevision: sql`${programme.draftRevision} + 1`, draftUpdatedById: userId, draftUpdatedAt: new Date() })
    .where(and(eq(programme.id, programmeId), eq(programme.draftRevision, baseRevision)))
    .returning();
  return row ?? null;
}

export async function getDraftEditorById(userId: string | null) {
  if (!userId) return null;
  const [row] = await db().select({ name: user.name }).from(user).where(eq(user.id, userId)).limit(1);
  return row?.name ?? null;
}

export async function listVersionsByProgrammeId(programmeId: string) {
  return db()
    .select({ version: programmeVersion, authorName: user.name })
    .from(programmeVersion)
    .innerJoin(user, eq(programmeVersion.authorId, user.id))
    .where(eq(programmeVersion.programmeId, programmeId))
    .orderBy(desc(programmeVersion.number));
}

export async function getLatestVersionByProgrammeId(programmeId: string, executor: Database = db()) {
  const [row] = await executor
    .select()
    .from(programmeVersion)
    .where(eq(programmeVersion.programmeId, programmeId))
    .orderBy(desc(programmeVersion.number))
    .limit(1);
  return row ?? null;
}

export async function insertProgrammeVersion(values: typeof programmeVersion.$inferInsert, executor: Database) {
  const [row] = await executor.insert(programmeVersion).values(values).returning();
  if (!row) throw new Error("Version insert returned nothing.");
  return row;
}

export async function listTemplatesByOrganizationId(organizationId: string) {
  return db().select().from(programmeTemplate).where(eq(programmeTemplate.organizationId, organizationId)).orderBy(programmeTemplate.name);
}

export async function insertProgrammeTemplate(values: typeof programmeTemplate.$inferInsert) {
  const [row] = await db().insert(programmeTemplate).values(values).returning();
  return row!;
}

export async function getProgrammeVersionById(versionId: string) {
  const [row] = await db().select().from(programmeVersion).where(eq(programmeVersion.id, versionId)).limit(1);
  return row ?? null;
}

// Every client with at least one published version, with those versions, for the daily rules.
export async function listPublishedSchedules() {
  const rows = await db()
    .select({ clientId: programme.clientId, number: programmeVersion.number, publishedAt: programmeVersion.publishedAt, content: programmeVersion.content })
    .from(programmeVersion)
    .innerJoin(programme, eq(programmeVersion.programmeId, programme.id));
  const byClient = new Map<string, typeof rows>();
  for (const row of rows) byClient.set(row.clientId, [...(byClient.get(row.clientId) ?? []), row]);
  return byClient;
}
