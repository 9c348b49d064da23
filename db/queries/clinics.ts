import "server-only";
import { eq } from "drizzle-orm";
import { z } from "zod";
import { db } from "../client";
import { organization } from "../schema";

// A clinic's contact details live in the organization's metadata (better-auth stores it as JSON text).
const contactSchema = z.object({ phone: z.string().optional(), email: z.string().optional(), address: z.string().optional() }).catch({});
export type ClinicContact = z.infer<typeof contactSchema>;

export async function getClinicById(organizationId: string) {
  const [row] = await db().select().from(organization).where(eq(organization.id, organizationId)).limit(1);
  if (!row) return null;
  let metadata: unknown = {};
  try {
    metadata = row.metadata ? JSON.parse(row.metadata) : {};
  } catch {
    metadata = {};
  }
  return { id: row.id, name: row.name, contact: contactSchema.parse(metadata) };
}
