import "server-only";
import { z } from "zod";
import { insertAuditEvent } from "@/db/queries/audit";
import { insertProgrammeTemplate } from "@/db/queries/programmes";
import type { Actor } from "@/lib/auth/actor";
import { forbidden } from "@/lib/errors";
import { parseInput } from "@/lib/validation";
import { programmeDraftSchema } from "./draft-schema";

// A therapist keeps the channels of a programme as one of the clinic's own starting points. Placement marks and
// photos belong to one client, so they are left out.
export const saveTemplateSchema = z.object({
  name: z.string({ error: "Name the template." }).trim().min(3, "Give the template a name of at least 3 characters.").max(80, "Keep the name under 80 characters."),
  description: z.string().trim().max(300, "Keep the description under 300 characters.").optional(),
  channels: programmeDraftSchema.shape.channels,
});

export async function saveProgrammeTemplate(actor: Actor, input: z.input<typeof saveTemplateSchema>) {
  if (actor.role !== "therapist") throw forbidden();
  const data = parseInput(saveTemplateSchema, input);
  const channels = data.channels.map((channel) => {
    const { target, side, electrodeType, placementNote, settings } = channel;
    return { target, side, electrodeType, placementNote, settings, markers: [null, null], photoIds: [] };
  });
  const row = await insertProgrammeTemplate({
    organizationId: actor.organizationId,
    name: data.name,
    description: data.description || null,
    content: { channels },
    createdById: actor.userId,
  });
  await insertAuditEvent({
    organizationId: actor.organizationId,
    actorUserId: actor.userId,
    action: "template.saved",
    entityType: "programme_template",
    entityId: row.id,
    after: { name: row.name, channels: channels.length },
  });
  return { templateId: row.id };
}
