import "server-only";
import { randomBytes } from "node:crypto";
import { insertAuditEvent } from "@/db/queries/audit";
import { insertInvitation } from "@/db/queries/invitations";
import type { JobExecutor, Transaction } from "@/db/transaction";
import type { Actor } from "@/lib/auth/actor";
import type { Role } from "@/lib/auth/roles";
import { INVITATION_LIFETIME_SECONDS } from "@/lib/auth/constants";
import { enqueueEmail } from "@/lib/email/enqueue";
import { env } from "@/lib/env";

// The invitation id doubles as the secret in the link, so it is long and random.
export function newInvitationId(): string {
  return randomBytes(24).toString("base64url");
}

export function invitationUrl(invitationId: string): string {
  return `${env().APP_URL}/invitations/${invitationId}`;
}

// Writes the invitation, its audit entry and its e-mail job in the caller's transaction.
export async function createInvitation(
  tx: Transaction,
  jobs: JobExecutor,
  input: { actor: Actor; email: string; inviteeName: string; role: Role; clientId?: string },
) {
  const row = await insertInvitation(
    {
      id: newInvitationId(),
      organizationId: input.actor.organizationId,
      email: input.email,
      inviteeName: input.inviteeName,
      role: input.role,
      status: "pending",
      inviterId: input.actor.userId,
      clientId: input.clientId ?? null,
      expiresAt: new Date(Date.now() + INVITATION_LIFETIME_SECONDS * 1000),
    },
    tx,
  );
  await insertAuditEvent(
    {
      organizationId: input.actor.organizationId,
      actorUserId: input.actor.userId,
      action: "invitation.created",
      entityType: "invitation",
      entityId: row.id,
      clientId: input.clientId ?? null,
      after: { email: row.email, role: row.role, inviteeName: row.inviteeName, expiresAt: row.expiresAt },
    },
    tx,
  );
  await enqueueEmail(
    {
      template: "invitation",
      to: row.email,
      data: {
        inviteeName: input.inviteeName,
        clinicName: input.actor.clinicName,
        inviterName: input.actor.name,
        role: input.role,
        url: invitationUrl(row.id),
      },
    },
    { jobs },
  );
  return row;
}
