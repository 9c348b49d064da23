import "server-only";
import { and, desc, eq, inArray } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db, type Database } from "../client";
import { redFlagClearance, screening, user } from "../schema";

export type NewScreening = typeof screening.$inferInsert;
export type NewRedFlagClearance = typeof redFlagClearance.$inferInsert;

const signer = alias(user, "signer");
const recorder = alias(user, "recorder");

// A screening row with the signing therapist's name, the shape every reader of screenings wants.
const withSigner = { screening, signedByName: signer.name };

export async function insertScreening(values: NewScreening, executor: Database = db()) {
  const [row] = await executor.insert(screening).values(values).returning();
  if (!row) throw new Error("Screening insert returned nothing.");
  return row;
}

export async function getLatestScreeningByClientId(clientId: string, executor: Database = db()) {
  const [row] = await executor
    .select(withSigner)
    .from(screening)
    .innerJoin(signer, eq(screening.signedById, signer.id))
    .where(eq(screening.clientId, clientId))
    .orderBy(desc(screening.version))
    .limit(1);
  return row ?? null;
}

export async function getScreeningByIdAndClientId(screeningId: string, clientId: string, executor: Database = db()) {
  const [row] = await executor
    .select(withSigner)
    .from(screening)
    .innerJoin(signer, eq(screening.signedById, signer.id))
    .where(and(eq(screening.id, screeningId), eq(screening.clientId, clientId)))
    .limit(1);
  return row ?? null;
}

export async function getScreeningByClientIdAndVersion(clientId: string, version: number, executor: Database = db()) {
  const [row] = await executor
    .select(withSigner)
    .from(screening)
    .innerJoin(signer, eq(screening.signedById, signer.id))
    .where(and(eq(screening.clientId, clientId), eq(screening.version, version)))
    .limit(1);
  return row ?? null;
}

export async function listScreeningsByClientId(clientId: string, executor: Database = db()) {
  return executor
    .select(withSigner)
    .from(screening)
    .innerJoin(signer, eq(screening.signedById, signer.id))
    .where(eq(screening.clientId, clientId))
    .orderBy(desc(screening.version));
}

export async function insertRedFlagClearance(values: NewRedFlagClearance, executor: Database = db()) {
  const [row] = await executor.insert(redFlagClearance).values(values).returning();
  if (!row) throw new Error("Red-flag clearance insert returned nothing.");
  return row;
}

export async function getRedFlagClearanceByScreeningIdAndFlag(screeningId: string, flag: string, executor: Database = db()) {
  const [row] = await executor
    .select()
    .from(redFlagClearance)
    .where(and(eq(redFlagClearance.screeningId, screeningId), eq(redFlagClearance.flag, flag)))
    .limit(1);
  return row ?? null;
}

export async function listRedFlagClearancesByScreeningIds(screeningIds: string[], executor: Database = db()) {
  if (screeningIds.length === 0) return [];
  return executor
    .select({ clearance: redFlagClearance, recordedByName: recorder.name })
    .from(redFlagClearance)
    .innerJoin(recorder, eq(redFlagClearance.recordedById, recorder.id))
    .where(inArray(redFlagClearance.screeningId, screeningIds))
    .orderBy(redFlagClearance.recordedAt);
}
