import "server-only";
import { insertAuditEvent } from "@/db/queries/audit";
import { getRedFlagClearanceByScreeningIdAndFlag, getScreeningByIdAndClientId, insertRedFlagClearance } from "@/db/queries/screenings";
import { inTransaction } from "@/db/transaction";
import type { Actor } from "@/lib/auth/actor";
import { requireClientAccess } from "@/lib/auth/access";
import { AppError, forbidden, notFound } from "@/lib/errors";
import { parseInput } from "@/lib/validation";
import { recordClearanceSchema } from "./clearance-schema";
import { redFlagLabel } from "./questions";
import { isUniqueViolation } from "./unique-violation";

const alreadyCleared = () =>
  new AppError("CONFLICT", "A clearance for this red flag is already recorded on this screening.", {
    flag: "A clearance for this red flag is already recorded on this screening.",
  });

// A therapist of the clinic records that a named clinician (the client's cardiologist, say) has cleared one red flag
// of one screening. Rampline records who gave it and what it covers; it does not judge it. Once per flag.
export async function recordRedFlagClearance(actor: Actor, clientId: string, screeningId: string, input: unknown) {
  if (actor.role !== "therapist") throw forbidden();
  const { client } = await requireClientAccess(actor, clientId);
  const data = parseInput(recordClearanceSchema, input);
  try {
    return await inTransaction(async (tx) => {
      const found = await getScreeningByIdAndClientId(screeningId, client.id, tx);
      if (!found) throw notFound("That screening");
      if (!found.screening.redFlags.includes(data.flag)) {
        throw new AppError("VALIDATION", "Some fields need attention.", {
          flag: `Screening version ${found.screening.version} does not record “${redFlagLabel(data.flag)}”, so there is nothing to clear.`,
        });
      }
      if (await getRedFlagClearanceByScreeningIdAndFlag(screeningId, data.flag, tx)) throw alreadyCleared();
      const row = await insertRedFlagClearance({ screeningId, ...data, recordedById: actor.userId }, tx);
      await insertAuditEvent(
        {
          organizationId: actor.organizationId,
          actorUserId: actor.userId,
          action: "screening.red-flag-cleared",
          entityType: "red_flag_clearance",
          entityId: row.id,
          clientId: client.id,
          before: { screeningId, version: found.screening.version, flag: data.flag, cleared: false },
          after: { screeningId, version: found.screening.version, flag: data.flag, cleared: true, clinicianName: data.clinicianName, note: data.note },
        },
        tx,
      );
      return { clearanceId: row.id, screeningId, flag: data.flag, recordedAt: row.recordedAt };
    });
  } catch (error) {
    // Two people recording the same clearance at once: the unique index refuses the second.
    if (isUniqueViolation(error, "red_flag_clearance_flag_idx")) throw alreadyCleared();
    throw error;
  }
}
