import "server-only";
import { db, type Database } from "../client";
import { auditEvent, type NewAuditEvent } from "../schema";

export async function insertAuditEvent(event: NewAuditEvent, executor: Database = db()): Promise<void> {
  await executor.insert(auditEvent).values(event);
}
