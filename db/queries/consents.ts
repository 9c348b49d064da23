import "server-only";
import { desc, eq } from "drizzle-orm";
import { db, type Database } from "../client";
import { consent, CONSENT_KINDS, user, type Consent } from "../schema";

export async function insertConsent(values: typeof consent.$inferInsert, executor: Database = db()) {
  const [row] = await executor.insert(consent).values(values).returning();
  if (!row) throw new Error("Consent insert returned nothing.");
  return row;
}

export async function listConsentEventsByClientId(clientId: string) {
  return db()
    .select({ consent, recordedByName: user.name })
    .from(consent)
    .innerJoin(user, eq(consent.recordedById, user.id))
    .where(eq(consent.clientId, clientId))
    .orderBy(desc(consent.recordedAt));
}

// The consent in force for each kind is the latest event of that kind.
export function currentConsents(events: { consent: Consent }[]) {
  const current = new Map<Consent["kind"], Consent>();
  for (const { consent: event } of events) if (!current.has(event.kind)) current.set(event.kind, event);
  return CONSENT_KINDS.map((kind) => ({ kind, event: current.get(kind) ?? null }));
}
