import "server-only";
import { insertAuditEvent } from "@/db/queries/audit";
import { getLatestCheckInByClientId, insertCheckIn } from "@/db/queries/check-ins";
import { insertFlags } from "@/db/queries/flags";
import { listPhotosByIds } from "@/db/queries/photos";
import { getUserById } from "@/db/queries/users";
import { getNotificationSettingByUserId } from "@/db/queries/messages";
import { inTransaction } from "@/db/transaction";
import type { Actor } from "@/lib/auth/actor";
import { requireClientAccess } from "@/lib/auth/access";
import { enqueueEmail } from "@/lib/email/enqueue";
import { env } from "@/lib/env";
import { AppError, forbidden } from "@/lib/errors";
import { flagsForCheckIn } from "@/lib/rules/check-in-rules";
import { parseInput } from "@/lib/validation";
import { checkInSchema, type CheckInInput } from "./schema";
import { matchToVersion } from "./match-to-version";
import { stopMessageFor } from "./stop-message";
import { versionForCheckIn } from "./version-for-check-in";

// A client, or a carer on their behalf (recorded as the carer's entry), logs a session. The check-in, the flags
// its rules raise and the audit entry are written together or not at all; an e-mail to the therapist is queued in
// the same transaction.
export async function logCheckIn(actor: Actor, clientId: string, input: CheckInInput) {
  if (actor.role !== "client" && actor.role !== "carer") throw forbidden();
  const { client } = await requireClientAccess(actor, clientId);
  const data = parseInput(checkInSchema, input);
  const { version, content } = await versionForCheckIn(client.id, data.versionNumber);
  const matched = matchToVersion(data, content);
  const photoIds = data.skin.flatMap((site) => site.photoIds);
  const photos = await listPhotosByIds(photoIds);
  if (photos.length !== new Set(photoIds).size || photos.some((photo) => photo.clientId !== client.id || photo.kind !== "skin")) {
    throw new AppError("VALIDATION", "Some fields need attention.", { skin: "A photo could not be found. Add it again." });
  }
  const previous = await getLatestCheckInByClientId(client.id);
  const raised = flagsForCheckIn({ ...matched, comfort: data.comfort, previousComfort: previous?.comfort ?? null });

  const result = await inTransaction(async (tx, jobs) => {
    const row = await insertCheckIn(
      {
        clientId: client.id,
        programmeVersionId: version.id,
        loggedById: actor.userId,
        loggedByRole: actor.role === "carer" ? "carer" : "client",
        sessionDate: data.sessionDate,
        minutes: data.minutes,
        comfort: data.comfort,
        movement: data.movement,
        fatigue: data.fatigue,
        channels: data.channels,
        skin: data.skin,
        electrodeCondition: data.electrodeCondition,
        notes: data.notes || null,
      },
      tx,
    );
    const flags = await insertFlags(
      raised.map((flag) => ({ organizationId: client.organizationId, clientId: client.id, checkInId: row.id, ...flag })),
      tx,
    );
    await insertAuditEvent(
      {
        organizationId: client.organizationId,
        actorUserId: actor.userId,
        action: "check-in.logged",
        entityType: "check_in",
        entityId: row.id,
        clientId: client.id,
        after: { sessionDate: row.sessionDate, minutes: row.minutes, loggedByRole: row.loggedByRole, version: version.number, flags: flags.map((f) => f.rule) },
      },
      tx,
    );
    const therapist = flags.length > 0 ? await getUserById(client.primaryTherapistId, tx) : null;
    const urgent = flags.some((f) => f.severity === "urgent");
    // Urgent reports always reach the therapist; review-level ones follow their e-mail settings.
    if (therapist && (urgent || (await getNotificationSettingByUserId(therapist.id)).emailFlags)) {
      await enqueueEmail({ template: "flag-raised", to: therapist.email, data: { name: therapist.name, urgent, url: `${env().APP_URL}/clients/${client.id}` } }, { jobs });
    }
    return { checkInId: row.id, flags: flags.map((f) => ({ id: f.id, rule: f.rule, severity: f.severity, title: f.title })) };
  });
  return { ...result, stopMessage: stopMessageFor(raised) };
}
