import "server-only";
import { insertAuditEvent } from "@/db/queries/audit";
import { updateClientDetailsById } from "@/db/queries/clients";
import { inTransaction } from "@/db/transaction";
import type { Actor } from "@/lib/auth/actor";
import { requireClientAccess } from "@/lib/auth/access";
import { forbidden } from "@/lib/errors";
import { parseInput } from "@/lib/validation";
import { clientDetailsSchema, type ClientDetailsInput } from "./schemas";

const FIELDS = ["condition", "affectedSide", "goals", "onsetDate"] as const;

// Only what changed goes into the audit trail, with its value before and after.
export async function updateClientDetails(actor: Actor, clientId: string, input: ClientDetailsInput) {
  if (actor.role !== "therapist") throw forbidden();
  const { client } = await requireClientAccess(actor, clientId);
  const data = parseInput(clientDetailsSchema, input);
  const changes = FIELDS.filter((field) => data[field] !== undefined && data[field] !== client[field]);
  if (changes.length === 0) return { clientId, changed: [] as string[] };
  const values = Object.fromEntries(changes.map((field) => [field, data[field]]));
  await inTransaction(async (tx) => {
    await updateClientDetailsById(clientId, values, tx);
    await insertAuditEvent(
      {
        organizationId: actor.organizationId,
        actorUserId: actor.userId,
        action: "client.details-changed",
        entityType: "client",
        entityId: clientId,
        clientId,
        before: Object.fromEntries(changes.map((field) => [field, client[field]])),
        after: values,
      },
      tx,
    );
  });
  return { clientId, changed: changes as string[] };
}
