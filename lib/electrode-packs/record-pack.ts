import "server-only";
import { z } from "zod";
import { insertAuditEvent } from "@/db/queries/audit";
import { insertElectrodePack } from "@/db/queries/electrode-packs";
import type { Actor } from "@/lib/auth/actor";
import { requireClientAccess } from "@/lib/auth/access";
import { forbidden } from "@/lib/errors";
import { parseInput } from "@/lib/validation";

export const recordPackSchema = z.object({
  openedOn: z
    .string({ error: "Choose the day you opened the pack." })
    .regex(/^\d{4}-\d{2}-\d{2}$/, "Choose the day you opened the pack.")
    .refine((value) => Date.parse(value) <= Date.now() + 24 * 60 * 60 * 1000, "The day cannot be in the future."),
  note: z.string().trim().max(200, "Keep the note under 200 characters.").optional(),
});

// The client or a carer records a new pack; the count of uses starts again from that day.
export async function recordElectrodePack(actor: Actor, clientId: string, input: z.input<typeof recordPackSchema>) {
  if (actor.role !== "client" && actor.role !== "carer") throw forbidden();
  const { client } = await requireClientAccess(actor, clientId);
  const data = parseInput(recordPackSchema, input);
  const row = await insertElectrodePack({ clientId: client.id, openedOn: data.openedOn, recordedById: actor.userId, note: data.note || null });
  await insertAuditEvent({
    organizationId: client.organizationId,
    actorUserId: actor.userId,
    action: "electrode-pack.opened",
    entityType: "electrode_pack",
    entityId: row.id,
    clientId: client.id,
    after: { openedOn: row.openedOn },
  });
  return { packId: row.id };
}
