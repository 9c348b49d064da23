import "server-only";
import { and, asc, eq } from "drizzle-orm";
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
