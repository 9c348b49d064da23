import "server-only";
import { z } from "zod";
import { insertAuditEvent } from "@/db/queries/audit";
import { insertVersionConfirmation } from "@/db/queries/confirmations";
import { getProgrammeByClientId, getLatestVersionByProgrammeId } from "@/db/queries/programmes";
import { inTransaction } from "@/db/transaction";
import type { Actor } from "@/lib/auth/actor";
import { requireClientAccess } from "@/lib/auth/access";
import { AppError, forbidden } from "@/lib/errors";
import { addToThread } from "@/lib/messages/post-message";
import { parseInput } from "@/lib/validation";

export const confirmVersionSchema = z.object({ versionNumber: z.number({ error: "Say which version your stimulator matches." }).int().min(1) });

// The client or a carer says the stimulator now matches the version in force; the thread shows it too.
export async function confirmVersion(actor: Actor, clientId: string, input: z.input<typeof confirmVersionSchema>) {
  if (actor.role !== "client" && actor.role !== "carer") throw forbidden();
  const { client } = await requireClientAccess(actor, clientId);
  const { versionNumber } = parseInput(confirmVersionSchema, input);
  const programme = await getProgrammeByClientId(client.id);
  const current = programme ? await getLatestVersionByProgrammeId(programme.id) : null;
  if (!current || current.number !== versionNumber) {
    throw new AppError("CONFLICT", current ? `Version ${current.number} is now in force: check your stimulator against it.` : "There is no programme to confirm yet.");
  }
  return inTransaction(async (tx, jobs) => {
    const row = await insertVersionConfirmation(current.id, actor.userId, tx);
    if (!row) return { confirmed: true, already: true };
    await addToThread(tx, jobs, { clientId: client.id, authorId: null, kind: "system", body: `${actor.name} confirmed that the stimulator now matches version ${current.number}.`, about: { type: "version", id: current.id } });
    await insertAuditEvent(
      { organizationId: client.organizationId, actorUserId: actor.userId, action: "version.confirmed", entityType: "programme_version", entityId: current.id, clientId: client.id, after: { version: current.number } },
      tx,
    );
    return { confirmed: true, already: false };
  });
}
