import "server-only";
import { and, asc, eq, inArray } from "drizzle-orm";
import { db, type Database } from "../client";
import { member, user } from "../schema";

export async function insertMember(values: { organizationId: string; userId: string; role: string }, executor: Database = db()) {
  await executor.insert(member).values({ id: crypto.randomUUID(), ...values });
}

export async function getMemberById(memberId: string) {
  const [row] = await db()
    .select({ member, user: { id: user.id, name: user.name, email: user.email, banned: user.banned } })
    .from(member)
    .innerJoin(user, eq(member.userId, user.id))
    .where(eq(member.id, memberId))
    .limit(1);
  return row ?? null;
}

export async function listStaffByOrganizationId(organizationId: string) {
  return db()
    .select({
      memberId: member.id,
      role: member.role,
      joinedAt: member.createdAt,
      userId: user.id,
      name: user.name,
      email: user.email,
      banned: user.banned,
    })
    .from(member)
    .innerJoin(user, eq(member.userId, user.id))
    .where(and(eq(member.organizationId, organizationId), inArray(member.role, ["admin", "therapist"])))
    .orderBy(asc(user.name));
}
