import "server-only";
import { getClientIdByUserId, getLinkedClientIdByCarerUserId, getMembershipByUserId } from "@/db/queries/memberships";
import { isRole, type Role } from "./roles";
import { auth } from "./server";

// Who is asking, resolved from the session cookie: the person, their clinic and role, and for a client or carer
// the one client record they may act on.
export type Actor = {
  userId: string;
  name: string;
  email: string;
  role: Role;
  organizationId: string;
  clinicName: string;
  clientId: string | null;
};

export async function getActorFromHeaders(headers: Headers): Promise<Actor | null> {
  const session = await auth.api.getSession({ headers });
  if (!session) return null;
  const membership = await getMembershipByUserId(session.user.id);
  if (!membership || membership.banned || !isRole(membership.role)) return null;
  const role = membership.role;
  let clientId: string | null = null;
  if (role === "client") clientId = await getClientIdByUserId(session.user.id);
  if (role === "carer") clientId = await getLinkedClientIdByCarerUserId(session.user.id);
  return {
    userId: session.user.id,
    name: session.user.name,
    email: session.user.email,
    role,
    organizationId: membership.organizationId,
    clinicName: membership.clinicName,
    clientId,
  };
}
