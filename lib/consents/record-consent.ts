import "server-only";
import { insertAuditEvent } from "@/db/queries/audit";
import { insertConsent } from "@/db/queries/consents";
import { inTransaction } from "@/db/transaction";
import type { Actor } from "@/lib/auth/actor";
import { requireClientAccess } from "@/lib/auth/access";
import { AppError, forbidden } from "@/lib/errors";
import { recordConsentSchema, type RecordConsentInput } from "@/lib/clients/schemas";
import { parseInput } from "@/lib/validation";

// A therapist records the client's consent as it was given (in person or in writing); the client may give or
// withdraw their own in Rampline. A withdrawal is a new event, so the history of who, when and how is kept.
export async function recordConsent(actor: Actor, clientId: string, input: RecordConsentInput) {
  if (actor.role !== "therapist" && actor.role !== "client") throw forbidden();
  const { client } = await requireClientAccess(actor, clientId);
  const data = parseInput(recordConsentSchema, input);
  if (actor.role === "client" && data.method !== "in-app") {
    throw new AppError("VALIDATION", "Some fields need attention.", { method: "Your own consent is recorded as given in Rampline." });
  }
  if (actor.role === "therapist" && data.method === "in-app") {
    throw new AppError("VALIDATION", "Some fields need attention.", {
      method: "Say whether the client agreed in person (verbally) or in writing.",
    });
  }
  return inTransaction(async (tx) => {
    const row = await insertConsent({ clientId: client.id, kind: data.kind, status: data.status, method: data.method, note: data.note ?? null, recordedById: actor.userId }, tx);
    await insertAuditEvent(
      {
        organizationId: actor.organizationId,
        actorUserId: actor.userId,
        action: data.status === "given" ? "consent.given" : "consent.withdrawn",
        entityType: "consent",
        entityId: row.id,
        clientId: client.id,
        after: { kind: data.kind, status: data.status, method: data.method, note: data.note ?? null },
      },
      tx,
    );
    return { consentId: row.id };
  });
}
