import "server-only";
import type { z } from "zod";
import { getDraftEditorById, ensureProgrammeForClient, updateDraftIfRevision } from "@/db/queries/programmes";
import type { Actor } from "@/lib/auth/actor";
import { requireClientAccess } from "@/lib/auth/access";
import { AppError, forbidden } from "@/lib/errors";
import { parseInput } from "@/lib/validation";
import { saveDraftSchema } from "./draft-schema";
import type { ProgrammeFormValues } from "./form-values";

const timeFormat = new Intl.DateTimeFormat("en-GB", { hour: "2-digit", minute: "2-digit", day: "numeric", month: "short", timeZone: "Europe/London" });

// Two therapists editing one draft must not silently overwrite each other: a save states the revision it started
// from and is refused (409) if someone else saved in between. The refused changes stay in the browser.
export async function saveDraft(actor: Actor, clientId: string, input: z.input<typeof saveDraftSchema>) {
  if (actor.role !== "therapist") throw forbidden();
  await requireClientAccess(actor, clientId);
  const { values, baseRevision } = parseInput(saveDraftSchema, input);
  const draft: ProgrammeFormValues = values;
  const programme = await ensureProgrammeForClient(clientId);
  const saved = await updateDraftIfRevision(programme.id, baseRevision, draft, actor.userId);
  if (!saved) {
    const current = await ensureProgrammeForClient(clientId);
    const who = (await getDraftEditorById(current.draftUpdatedById)) ?? "Someone";
    const when = current.draftUpdatedAt ? ` at ${timeFormat.format(current.draftUpdatedAt)}` : "";
    throw new AppError(
      "CONFLICT",
      `${who} saved this draft${when} after you opened it. Your changes are still on this screen and were not saved: note what you need, then reload to see their version.`,
    );
  }
  return { revision: saved.draftRevision, savedAt: saved.draftUpdatedAt };
}
