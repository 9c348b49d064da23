import { hashPassword } from "better-auth/crypto";
import { and, eq } from "drizzle-orm";
import type { Database } from "../client";
import { carerLink, client, member, organization } from "../schema";
import { getUserByEmail, insertUserWithPassword } from "../queries/users";
import { DEMO_PASSWORD, demoAdmin, demoCarers, demoClients, demoClinic, demoTherapists, type DemoPerson } from "./demo-clinic";

// Idempotent: every row is looked up by its natural key first, so a second run adds nothing and changes nothing.
export async function seedDemo(database: Database): Promise<{ created: number }> {
  let created = 0;
  const passwordHash = await hashPassword(DEMO_PASSWORD);

  const [clinic] = await database.select().from(organization).where(eq(organization.slug, demoClinic.slug));
  if (!clinic) {
    await database.insert(organization).values(demoClinic);
    created++;
  }

  async function ensurePerson(person: DemoPerson, role: string): Promise<string> {
    let found = await getUserByEmail(person.email, database);
    if (!found) {
      await insertUserWithPassword({ id: `demo-${person.key}`, name: person.name, email: person.email, passwordHash }, database);
      found = await getUserByEmail(person.email, database);
      created++;
    }
    const userId = found!.id;
    const [membership] = await database
      .select()
      .from(member)
      .where(and(eq(member.organizationId, demoClinic.id), eq(member.userId, userId)));
    if (!membership) {
      await database.insert(member).values({ id: `demo-member-${person.key}`, organizationId: demoClinic.id, userId, role });
      created++;
    }
    return userId;
  }

  await ensurePerson(demoAdmin, "admin");
  const therapistIds = new Map<string, string>();
  for (const therapist of demoTherapists) therapistIds.set(therapist.key, await ensurePerson(therapist, "therapist"));

  const clientIds = new Map<string, string>();
  for (const person of demoClients) {
    const userId = await ensurePerson(person, "client");
    const id = `demo-client-${person.key}`;
    clientIds.set(person.key, id);
    const [existing] = await database.select().from(client).where(eq(client.id, id));
    if (!existing) {
      const therapistId = therapistIds.get(person.therapist)!;
      await database.insert(client).values({
        id,
        organizationId: demoClinic.id,
        userId,
        fullName: person.name,
        email: person.email,
        primaryTherapistId: therapistId,
        createdById: therapistId,
      });
      created++;
    }
  }

  for (const carer of demoCarers) {
    const userId = await ensurePerson(carer, "carer");
    const id = `demo-carer-link-${carer.key}`;
    const [existing] = await database.select().from(carerLink).where(eq(carerLink.id, id));
    if (!existing) {
      await database.insert(carerLink).values({
        id,
        clientId: clientIds.get(carer.client)!,
        carerUserId: userId,
        carerName: carer.name,
        carerEmail: carer.email,
        relationship: carer.relationship,
        consentSource: "client",
        consentMethod: "in-app",
        consentRecordedById: (await getUserByEmail(demoClients.find((c) => c.key === carer.client)!.email, database))!.id,
      });
      created++;
    }
  }
  return { created };
}
