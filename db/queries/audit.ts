import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { db, type Database } from "../client";
import { auditEvent, client, user, type NewAuditEvent } from "../schema";

export async function insertAuditEvent(event: NewAuditEvent, executor: Database = db()): Promise<void> {
  await executor.insert(auditEvent).values(event);
}

export async function listAuditEventsByOrganizationId(organizationId: string, options: { clientId?: string; limit?: number } = {}) {
  const conditions = [eq(auditEvent.organizationId, organizationId)];
  if (options.clientId) conditions.push(eq(auditEvent.clientId, options.clientId));
  return db()
    .select({ event: auditEvent, actorName: user.name, clientName: client.fullName })
    .from(auditEvent)
    .leftJoin(user, eq(auditEvent.actorUserId, user.id))
    .leftJoin(client, eq(auditEvent.clientId, client.id))
    .where(and(...conditions))
    .orderBy(desc(auditEvent.createdAt))
    .limit(options.limit ?? 200);
}
