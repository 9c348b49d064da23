import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { db } from "../client";
import { carerLink, client, member, organization, user } from "../schema";

// Rampline keeps each person in one clinic, so the first membership is the membership.
export async function getMembershipByUserId(userId: string) {
  const [row] = await db()
    .select({
      memberId: member.id,
      role: member.role,
      organizationId: organization.id,
      clinicName: organization.name,
      banned: user.banned,
    })
    .from(member)
    .innerJoin(organization, eq(member.organizationId, organization.id))
    .innerJoin(user, eq(member.userId, user.id))
    .where(eq(member.userId, userId))
    .orderBy(member.createdAt)
    .limit(1);
  return row ?? null;
}

export async function getClientIdByUserId(userId: string): Promise<string | null> {
  const [row] = await db().select({ id: client.id }).from(client).where(eq(client.userId, userId)).limit(1);
  return row?.id ?? null;
}

export async function getLinkedClientIdByCarerUserId(carerUserId: string): Promise<string | null> {
  const [row] = await db()
    .select({ clientId: carerLink.clientId })
    .from(carerLink)
    .where(and(eq(carerLink.carerUserId, carerUserId), isNull(carerLink.endedAt)))
    .orderBy(carerLink.createdAt)
    .limit(1);
  return row?.clientId ?? null;
}
