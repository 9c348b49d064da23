import "server-only";
import type { z } from "zod";
import { insertAuditEvent } from "@/db/queries/audit";
import { listCircleRecipientsByClientId } from "@/db/queries/client-circle";
import { getLatestVersionByProgrammeId, insertProgrammeVersion, lockProgrammeByClientId } from "@/db/queries/programmes";
import { inTransaction } from "@/db/transaction";
import type { Actor } from "@/lib/auth/actor";
import { requireClientAccess } from "@/lib/auth/access";
import { enqueueEmail } from "@/lib/email/enqueue";
import { addToThread } from "@/lib/messages/post-message";
import { getNotificationSettingByUserId } from "@/db/queries/messages";
import { env } from "@/lib/env";
import { AppError, forbidden } from "@/lib/errors";
import { parseInput } from "@/lib/validation";
import type { ProgrammeContent } from "./content";
import { describeChange, diffProgrammes } from "./diff";
import { publishSchema } from "./draft-schema";
import { formValuesToContentInput, type ProgrammeFormValues } from "./form-values";
import { checkReadyToPublish } from "./publish-checks";

// Publishing turns the draft the therapist is looking at into the next immutable version, with its author, time and
// reason, then tells the client and carers (without clinical detail) that there is an update.
export async function publishProgramme(actor: Actor, clientId: string, input: z.input<typeof publishSchema>) {
  if (actor.role !== "therapist") throw forbidden();
  await requireClientAccess(actor, clientId);
  const { reason, baseRevision, promptedBy } = parseInput(publishSchema, input);
  return inTransaction(async (tx, jobs) => {
    const programme = await lockProgrammeByClientId(clientId, tx);
    if (!programme?.draft) throw new AppError("BLOCKED", "There is no draft to publish yet.", undefined, ["Save a draft first."]);
    if (programme.draftRevision !== baseRevision) {
      throw new AppError("CONFLICT", "The draft changed since you opened it. Reload to see the latest before publishing.");
    }
    const { content, reasons } = await checkReadyToPublish(clientId, formValuesToContentInput(programme.draft as ProgrammeFormValues));
    if (!content) throw new AppError("BLOCKED", "This programme cannot be published yet.", undefined, reasons);
    const previous = await getLatestVersionByProgrammeId(programme.id, tx);
    const changes = previous ? diffProgrammes(previous.content as ProgrammeContent, content).map(describeChange) : [];
    if (previous && changes.length === 0) {
      throw new AppError("BLOCKED", "Nothing has changed since the last version.", undefined, ["Change something before publishing a new version."]);
    }
    const version = await insertProgrammeVersion(
      {
        programmeId: programme.id,
        number: (previous?.number ?? 0) + 1,
        content,
        reason,
        promptedByType: promptedBy?.type ?? null,
        promptedById: promptedBy?.id ?? null,
        authorId: actor.userId,
      },
      tx,
    );
    await insertAuditEvent(
      {
        organizationId: actor.organizationId,
        actorUserId: actor.userId,
        action: "programme.published",
        entityType: "programme_version",
        entityId: version.id,
        clientId,
        before: previous ? { version: previous.number } : null,
        after: { version: version.number, reason, changes },
      },
      tx,
    );
    // The thread shows the change where the conversation about it happened.
    const summary = changes.length > 0 ? ` What changed: ${changes.join("; ")}.` : "";
    await addToThread(tx, jobs, {
      clientId,
      authorId: null,
      kind: "system",
      body: `${actor.name} published version ${version.number} of the programme. Reason: ${reason}${summary} Please set your stimulator to match, then confirm it on your Programme page.`,
      about: { type: "version", id: version.id },
    });
    for (const person of await listCircleRecipientsByClientId(clientId, tx)) {
      if (!(await getNotificationSettingByUserId(person.id)).emailProgrammeUpdates) continue;
      await enqueueEmail(
        { template: "programme-updated", to: person.email, data: { name: person.name, clinicName: actor.clinicName, url: `${env().APP_URL}/programme` } },
        { jobs },
      );
    }
    return { versionId: version.id, number: version.number, changes };
  });
}
