import "server-only";
import { insertAuditEvent } from "@/db/queries/audit";
import { getOpenCarerLinkByClientAndEmail, insertCarerLink } from "@/db/queries/carers";
import { getUserByEmail } from "@/db/queries/users";
import { inTransaction } from "@/db/transaction";
import type { Actor } from "@/lib/auth/actor";
import { requireClientAccess } from "@/lib/auth/access";
import { AppError, forbidden } from "@/lib/errors";
import { parseInput } from "@/lib/validation";
import { createInvitation } from "./create";
import { inviteCarerSchema, type InviteCarerInput } from "./schemas";

// A client invites a carer for themselves, or their therapist does so with the client's consent on record.
export async function inviteCarer(actor: Actor, clientId: string, input: InviteCarerInput) {
  if (actor.role !== "client" && actor.role !== "therapist") throw forbidden();
  const { client } = await requireClientAccess(actor, clientId);
  const data = parseInput(inviteCarerSchema, input);
  const consentSource = actor.role === "client" ? "client" : "recorded-by-therapist";
  if (consentSource === "client" && data.consentMethod !== "in-app") {
    throw new AppError("VALIDATION", "Some fields need attention.", { consentMethod: "Choose in-app consent." });
  }
  if (consentSource === "recorded-by-therapist" && data.consentMethod === "in-app") {
    throw new AppError("VALIDATION", "Some fields need attention.", {
      consentMethod: "Say whether the client agreed in person (verbally) or in writing.",
    });
  }
  if (data.carerEmail === client.email) {
    throw new AppError("VALIDATION", "Some fields need attention.", {
      carerEmail: "A carer needs their own e-mail address, not the client's.",
    });
  }
  return inTransaction(async (tx, jobs) => {
    const taken = "That e-mail address already belongs to someone on Rampline.";
    if ((await getUserByEmail(data.carerEmail, tx)) || (await getOpenCarerLinkByClientAndEmail(client.id, data.carerEmail, tx))) {
      throw new AppError("CONFLICT", taken, { carerEmail: taken });
    }
    const invitation = await createInvitation(tx, jobs, {
      actor,
      email: data.carerEmail,
      inviteeName: data.carerName,
      role: "carer",
      clientId: client.id,
    });
    const link = await insertCarerLink(
      {
        clientId: client.id,
        invitationId: invitation.id,
        carerName: data.carerName,
        carerEmail: data.carerEmail,
        relationship: data.relationship,
        consentSource,
        consentMethod: data.consentMethod,
        consentNote: data.consentNote || null,
        consentRecordedById: actor.userId,
      },
      tx,
    );
    await insertAuditEvent(
      {
        organizationId: actor.organizationId,
        actorUserId: actor.userId,
        action: "carer.consent-recorded",
        entityType: "carer_link",
        entityId: link.id,
        clientId: client.id,
        after: { carerName: data.carerName, relationship: data.relationship, consentSource, consentMethod: data.consentMethod },
      },
      tx,
    );
    return { carerLinkId: link.id, invitationId: invitation.id };
  });
}
