import "server-only";
import { z } from "zod";
import { insertAuditEvent } from "@/db/queries/audit";
import { getMemberById } from "@/db/queries/members";
import { setUserBannedById } from "@/db/queries/users";
import { inTransaction } from "@/db/transaction";
import type { Actor } from "@/lib/auth/actor";
import { forbidden, notFound } from "@/lib/errors";
import { parseInput } from "@/lib/validation";

export const setTherapistActiveSchema = z.object({ active: z.boolean({ error: "Say whether the account is active." }) });

// A therapist of the admin's own clinic; anyone else is reported as not found.
export async function requireTherapistMember(actor: Actor, memberId: string) {
  const found = await getMemberById(memberId);
  if (!found || found.member.organizationId !== actor.organizationId || found.member.role !== "therapist") {
    throw notFound("That therapist");
  }
  return found;
}

// Deactivating keeps the therapist's records and history but stops them signing in, at once and everywhere.
export async function setTherapistActive(actor: Actor, memberId: string, input: z.input<typeof setTherapistActiveSchema>) {
  if (actor.role !== "admin") throw forbidden();
  const { active } = parseInput(setTherapistActiveSchema, input);
  const found = await requireTherapistMember(actor, memberId);
  await inTransaction(async (tx) => {
    await setUserBannedById(found.user.id, !active, "Deactivated by the clinic admin", tx);
    await insertAuditEvent(
      {
        organizationId: actor.organizationId,
        actorUserId: actor.userId,
        action: active ? "therapist.reactivated" : "therapist.deactivated",
        entityType: "member",
        entityId: memberId,
        before: { active: !found.user.banned },
        after: { active },
      },
      tx,
    );
  });
  return { memberId, active };
}
