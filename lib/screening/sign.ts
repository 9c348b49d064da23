import "server-only";
import { insertAuditEvent } from "@/db/queries/audit";
import { getLatestScreeningByClientId, insertScreening } from "@/db/queries/screenings";
import { inTransaction } from "@/db/transaction";
import type { Actor } from "@/lib/auth/actor";
import { requireClientAccess } from "@/lib/auth/access";
import { AppError, forbidden } from "@/lib/errors";
import { parseInput } from "@/lib/validation";
import { allConcerns, redFlagsPresent } from "./rules";
import { signScreeningSchema } from "./schema";
import { isUniqueViolation } from "./unique-violation";

// Two therapists signing for the same client at the same moment both read version N and try to write N + 1; the
// unique index refuses the second, which then tries again with the next number. Each attempt is a fresh transaction.
const MAX_ATTEMPTS = 5;

export type SignedScreening = {
  screeningId: string;
  version: number;
  outcome: string;
  redFlags: string[];
  rescreenOn: string | null;
  signedAt: Date;
};

// A therapist of the client's clinic signs a screening: a new, immutable version in their name, at this moment.
export async function signScreening(actor: Actor, clientId: string, input: unknown): Promise<SignedScreening> {
  if (actor.role !== "therapist") throw forbidden();
  const { client } = await requireClientAccess(actor, clientId);
  const answers = parseInput(signScreeningSchema, input);
  const redFlags = redFlagsPresent(answers);
  const concerns = allConcerns(answers).map((c) => ({ code: c.code, level: c.level, ...(c.site ? { site: c.site.name } : {}) }));
  const rescreenOn = answers.outcome.rescreenOn ?? null;

  for (let attempt = 1; ; attempt++) {
    try {
      return await inTransaction(async (tx) => {
        const previous = await getLatestScreeningByClientId(client.id, tx);
        const version = (previous?.screening.version ?? 0) + 1;
        const row = await insertScreening(
          { clientId: client.id, version, answers, redFlags, outcome: answers.outcome.result, rescreenOn, signedById: actor.userId },
          tx,
        );
        await insertAuditEvent(
          {
            organizationId: actor.organizationId,
            actorUserId: actor.userId,
            action: "screening.signed",
            entityType: "screening",
            entityId: row.id,
            clientId: client.id,
            before: previous ? { version: previous.screening.version, outcome: previous.screening.outcome } : null,
            after: { version, outcome: row.outcome, redFlags, concerns, rescreenOn, signedById: actor.userId, signedAt: row.signedAt },
          },
          tx,
        );
        return { screeningId: row.id, version, outcome: row.outcome, redFlags, rescreenOn, signedAt: row.signedAt };
      });
    } catch (error) {
      if (!isUniqueViolation(error, "screening_client_version_idx")) throw error;
      if (attempt >= MAX_ATTEMPTS) {
        throw new AppError("CONFLICT", "Other screenings for this client were being signed at the same moment. Reload the page and sign again.");
      }
    }
  }
}
