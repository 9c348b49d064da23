import "server-only";
import { and, desc, eq, inArray } from "drizzle-orm";
import { db, type Database } from "../client";
import { invitation, organization, user } from "../schema";

export type NewInvitation = typeof invitation.$inferInsert;

export async function insertInvitation(values: NewInvitation, executor: Database = db()) {
  const [row] = await executor.insert(invitation).values(values).returning();
  if (!row) throw new Error("Invitation insert returned nothing.");
  return row;
}

export async function getInvitationById(invitationId: string, executor: Database = db()) {
  const [row] = await executor
    .select({
      invitation,
      clinicName: organization.name,
      inviterName: user.name,
    })
    .from(invitation)
    .innerJoin(organization, eq(invitation.organizationId, organization.id))
    .innerJoin(user, eq(invitation.inviterId, user.id))
    .where(eq(invitation.id, invitationId))
    .limit(1);
  return row ?? null;
}

// Locks the row so two people opening the same link cannot both accept it.
export async function lockInvitationById(invitationId: string, executor: Database) {
  const [row] = await executor.select().from(invitation).where(eq(invitation.id, invitationId)).for("update").limit(1);
  return row ?? null;
}

export async function setInvitationStatusById(invitationId: string, status: string, executor: Database = db()) {
  await executor.update(invitation).set({ status }).where(eq(invitation.id, invitationId));
}

export async function cancelPendingInvitationsByEmail(
  organizationId: string,
  email: string,
  roles: string[],
  executor: Database = db(),
) {
  await executor
    .update(invitation)
    .set({ status: "canceled" })
    .where(
      and(
        eq(invitation.organizationId, organizationId),
        eq(invitation.email, email),
        eq(invitation.status, "pending"),
        inArray(invitation.role, roles),
      ),
    );
}

export async function listPendingInvitationsByOrganizationId(organizationId: string, roles: string[]) {
  return db()
    .select()
    .from(invitation)
    .where(
      and(
        eq(invitation.organizationId, organizationId),
        eq(invitation.status, "pending"),
        inArray(invitation.role, roles),
      ),
    )
    .orderBy(desc(invitation.createdAt));
}
