import "server-only";
import { z } from "zod";
import { getClientById } from "@/db/queries/clients";
import { insertAuditEvent } from "@/db/queries/audit";
import { getFlagById, updateFlagById } from "@/db/queries/flags";
import { inTransaction } from "@/db/transaction";
import type { Actor } from "@/lib/auth/actor";
import { canAccessClient } from "@/lib/auth/access";
import { AppError, forbidden, notFound } from "@/lib/errors";
import { parseInput } from "@/lib/validation";

export const updateFlagSchema = z.discriminatedUnion(
  "action",
  [
    z.object({ action: z.literal("acknowledge") }),
    z.object({ action: z.literal("resolve"), note: z.string({ error: "Say how it was resolved." }).trim().min(3, "Say how it was resolved.").max(1000, "Keep the note under 1,000 characters.") }),
  ],
  { error: "Choose to acknowledge or resolve the flag." },
);

export async function requireFlagAccess(actor: Actor, flagId: string) {
  const flag = await getFlagById(flagId);
  const client = flag ? await getClientById(flag.clientId) : null;
  if (!flag || !client || !canAccessClient(actor, client)) throw notFound("That flag");
  return { flag, client };
}

// A therapist acknowledges a flag (someone is on it) and resolves it with a note; a resolved flag stays in the record.
export async function updateFlag(actor: Actor, flagId: string, input: z.input<typeof updateFlagSchema>) {
  if (actor.role !== "therapist") throw forbidden();
  const { flag } = await requireFlagAccess(actor, flagId);
  const data = parseInput(updateFlagSchema, input);
  if (flag.status === "resolved") throw new AppError("CONFLICT", "This flag is already resolved.");
  const now = new Date();
  const values =
    data.action === "acknowledge"
      ? { status: "acknowledged" as const, acknowledgedById: actor.userId, acknowledgedAt: now }
      : { status: "resolved" as const, resolvedById: actor.userId, resolvedAt: now, resolutionNote: data.note, ...(flag.acknowledgedAt ? {} : { acknowledgedById: actor.userId, acknowledgedAt: now }) };
  return inTransaction(async (tx) => {
    const row = await updateFlagById(flag.id, values, tx);
    await insertAuditEvent(
      {
        organizationId: flag.organizationId,
        actorUserId: actor.userId,
        action: data.action === "acknowledge" ? "flag.acknowledged" : "flag.resolved",
        entityType: "flag",
        entityId: flag.id,
        clientId: flag.clientId,
        before: { status: flag.status },
        after: { status: row!.status, ...(data.action === "resolve" ? { note: data.note } : {}) },
      },
      tx,
    );
    return { flagId: flag.id, status: row!.status };
  });
}
