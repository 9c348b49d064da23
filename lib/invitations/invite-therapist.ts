import "server-only";
import { getUserByEmail } from "@/db/queries/users";
import { cancelPendingInvitationsByEmail } from "@/db/queries/invitations";
import { inTransaction } from "@/db/transaction";
import type { Actor } from "@/lib/auth/actor";
import { AppError, forbidden } from "@/lib/errors";
import { parseInput } from "@/lib/validation";
import { createInvitation } from "./create";
import { inviteTherapistSchema, type InviteTherapistInput } from "./schemas";

// A clinic admin invites a therapist. Inviting the same address again replaces the earlier, unused invitation.
export async function inviteTherapist(actor: Actor, input: InviteTherapistInput) {
  if (actor.role !== "admin") throw forbidden();
  const { name, email } = parseInput(inviteTherapistSchema, input);
  return inTransaction(async (tx, jobs) => {
    if (await getUserByEmail(email, tx)) {
      throw new AppError("CONFLICT", "That e-mail address already has a Rampline account.", {
        email: "That e-mail address already has a Rampline account.",
      });
    }
    await cancelPendingInvitationsByEmail(actor.organizationId, email, ["therapist"], tx);
    const row = await createInvitation(tx, jobs, { actor, email, inviteeName: name, role: "therapist" });
    return { invitationId: row.id, email: row.email, expiresAt: row.expiresAt };
  });
}
