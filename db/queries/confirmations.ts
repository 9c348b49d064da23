import "server-only";
import { eq } from "drizzle-orm";
import { db, type Database } from "../client";
import { programme, programmeVersion, user, versionConfirmation } from "../schema";

export async function insertVersionConfirmation(programmeVersionId: string, confirmedById: string, executor: Database = db()) {
  const [row] = await executor.insert(versionConfirmation).values({ programmeVersionId, confirmedById }).onConflictDoNothing().returning();
  return row ?? null;
}

export async function listConfirmationsByVersionId(programmeVersionId: string) {
  return db()
    .select({ confirmation: versionConfirmation, name: user.name })
    .from(versionConfirmation)
    .innerJoin(user, eq(versionConfirmation.confirmedById, user.id))
    .where(eq(versionConfirmation.programmeVersionId, programmeVersionId));
}

export async function listConfirmationsByClientId(clientId: string) {
  return db()
    .select({ at: versionConfirmation.confirmedAt, name: user.name, versionNumber: programmeVersion.number })
    .from(versionConfirmation)
    .innerJoin(user, eq(versionConfirmation.confirmedById, user.id))
    .innerJoin(programmeVersion, eq(versionConfirmation.programmeVersionId, programmeVersion.id))
    .innerJoin(programme, eq(programmeVersion.programmeId, programme.id))
    .where(eq(programme.clientId, clientId));
}
