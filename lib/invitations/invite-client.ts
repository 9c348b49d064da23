import "server-only";
import { insertAuditEvent } from "@/db/queries/audit";
import { getClientByOrganizationAndEmail, insertClient } from "@/db/queries/clients";
import { getUserByEmail } from "@/db/queries/users";
import { inTransaction } from "@/db/transaction";
import type { Actor } from "@/lib/auth/actor";
import { AppError, forbidden } from "@/lib/errors";
import { parseInput } from "@/lib/validation";
import { createInvitation } from "./create";
import { inviteClientSchema, type InviteClientInput } from "./schemas";

// A therapist creates a client record and invites the client to it; the therapist becomes the primary therapist.
export async function inviteClient(actor: Actor, input: InviteClientInput) {
  if (actor.role !== "therapist") throw forbidden();
  const { fullName, email } = parseInput(inviteClientSchema, input);
  return inTransaction(async (tx, jobs) => {
    const taken = "That e-mail address already belongs to someone on Rampline.";
    if ((await getUserByEmail(email, tx)) || (await getClientByOrganizationAndEmail(actor.organizationId, email))) {
      throw new AppError("CONFLICT", taken, { email: taken });
    }
    const record = await insertClient(
      {
        organizationId: actor.organizationId,
        fullName,
        email,
        primaryTherapistId: actor.userId,
        createdById: actor.userId,
      },
      tx,
    );
    await insertAuditEvent(
      {
        organizationId: actor.organizationId,
        actorUserId: actor.userId,
        action: "client.created",
        entityType: "client",
        entityId: record.id,
        clientId: record.id,
        after: { fullName, email, primaryTherapistId: actor.userId },
      },
      tx,
    );
    await createInvitation(tx, jobs, { actor, email, inviteeName: fullName, role: "client", clientId: record.id });
    return { clientId: record.id };
  });
}
