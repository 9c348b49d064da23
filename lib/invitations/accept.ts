import "server-only";
import { hashPassword } from "better-auth/crypto";
import { insertAuditEvent } from "@/db/queries/audit";
import { linkCarerUserByInvitationId } from "@/db/queries/carers";
import { linkClientUserById } from "@/db/queries/clients";
import { lockInvitationById, setInvitationStatusById } from "@/db/queries/invitations";
import { insertMember } from "@/db/queries/members";
import { getUserByEmail, insertUserWithPassword } from "@/db/queries/users";
import { inTransaction } from "@/db/transaction";
import { isRole } from "@/lib/auth/roles";
import { AppError, notFound } from "@/lib/errors";
import { parseInput } from "@/lib/validation";
import { acceptInvitationSchema, type AcceptInvitationInput } from "./schemas";

export function invitationProblem(status: string, expiresAt: Date): AppError | null {
  if (status === "accepted") {
    return new AppError("GONE", "This invitation has already been used. Sign in with the password you chose.");
  }
  if (status !== "pending") return new AppError("GONE", "This invitation was withdrawn. Ask your clinic for a new one.");
  if (expiresAt.getTime() <= Date.now()) {
    return new AppError("GONE", "This invitation has expired. Ask your clinic to send a new one.");
  }
  return null;
}

// Accepting creates the account, the clinic membership and the link to the client record in one transaction, so a
// failure part-way leaves the invitation usable rather than half-accepted.
export async function acceptInvitation(invitationId: string, input: AcceptInvitationInput) {
  const data = parseInput(acceptInvitationSchema, input);
  const passwordHash = await hashPassword(data.password);
  return inTransaction(async (tx) => {
    const invitation = await lockInvitationById(invitationId, tx);
    if (!invitation || !isRole(invitation.role)) throw notFound("That invitation");
    const problem = invitationProblem(invitation.status, invitation.expiresAt);
    if (problem) throw problem;
    if (await getUserByEmail(invitation.email, tx)) {
      throw new AppError("CONFLICT", "That e-mail address already has a Rampline account. Sign in instead.");
    }
    const userId = crypto.randomUUID();
    await insertUserWithPassword({ id: userId, name: data.name, email: invitation.email, passwordHash }, tx);
    await insertMember({ organizationId: invitation.organizationId, userId, role: invitation.role }, tx);
    if (invitation.role === "client" && invitation.clientId) {
      await linkClientUserById(invitation.clientId, userId, tx);
    }
    if (invitation.role === "carer") await linkCarerUserByInvitationId(invitation.id, userId, tx);
    await setInvitationStatusById(invitation.id, "accepted", tx);
    await insertAuditEvent(
      {
        organizationId: invitation.organizationId,
        actorUserId: userId,
        action: "invitation.accepted",
        entityType: "invitation",
        entityId: invitation.id,
        clientId: invitation.clientId,
        before: { status: invitation.status },
        after: { status: "accepted", userId, role: invitation.role },
      },
      tx,
    );
    return { userId, email: invitation.email, role: invitation.role };
  });
}
