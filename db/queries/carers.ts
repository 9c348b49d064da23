import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { db, type Database } from "../client";
import { carerLink, type NewCarerLink } from "../schema";

export async function insertCarerLink(values: NewCarerLink, executor: Database = db()) {
  const [row] = await executor.insert(carerLink).values(values).returning();
  if (!row) throw new Error("Carer link insert returned nothing.");
  return row;
}

export async function getOpenCarerLinkByClientAndEmail(clientId: string, email: string, executor: Database = db()) {
  const [row] = await executor
    .select()
    .from(carerLink)
    .where(and(eq(carerLink.clientId, clientId), eq(carerLink.carerEmail, email), isNull(carerLink.endedAt)))
    .limit(1);
  return row ?? null;
}

export async function listCarersByClientId(clientId: string) {
  return db()
    .select()
    .from(carerLink)
    .where(and(eq(carerLink.clientId, clientId), isNull(carerLink.endedAt)))
    .orderBy(carerLink.createdAt);
}

export async function linkCarerUserByInvitationId(invitationId: string, carerUserId: string, executor: Database) {
  const [row] = await executor
    .update(carerLink)
    .set({ carerUserId })
    .where(eq(carerLink.invitationId, invitationId))
    .returning();
  return row ?? null;
}
