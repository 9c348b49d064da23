// Builds clinics and people straight in the test database, each with unique names, so test files can run in
// parallel without seeing each other's rows. Every value here is invented test data.
import { hashPassword } from "better-auth/crypto";
import { db } from "@/db/client";
import { carerLink, client, member, organization } from "@/db/schema";
import { insertUserWithPassword } from "@/db/queries/users";
import type { Actor } from "@/lib/auth/actor";
import type { Role } from "@/lib/auth/roles";

export const TEST_PASSWORD = "test-password-123";
let passwordHash: Promise<string> | undefined;

export function uniqueSuffix(): string {
  return `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 8)}`;
}

export async function createClinic(name = "Test clinic") {
  const id = `org-${uniqueSuffix()}`;
  await db().insert(organization).values({ id, name: `${name} ${id}`, slug: id });
  return { organizationId: id, clinicName: `${name} ${id}` };
}

type Clinic = Awaited<ReturnType<typeof createClinic>>;

export async function createPerson(clinic: Clinic, role: Role, options: { clientId?: string; therapistId?: string } = {}) {
  passwordHash ??= hashPassword(TEST_PASSWORD);
  const suffix = uniqueSuffix();
  const userId = `user-${suffix}`;
  const email = `${role}-${suffix}@test.example`;
  const name = `${role[0]!.toUpperCase()}${role.slice(1)} ${suffix}`;
  await insertUserWithPassword({ id: userId, name, email, passwordHash: await passwordHash });
  await db().insert(member).values({ id: `member-${suffix}`, organizationId: clinic.organizationId, userId, role });
  let clientId: string | null = null;
  if (role === "client") {
    clientId = `client-${suffix}`;
    const therapistId = options.therapistId ?? (await createPerson(clinic, "therapist")).userId;
    await db().insert(client).values({
      id: clientId,
      organizationId: clinic.organizationId,
      userId,
      fullName: name,
      email,
      primaryTherapistId: therapistId,
      createdById: therapistId,
    });
  }
  if (role === "carer") {
    if (!options.clientId) throw new Error("A carer needs a clientId");
    clientId = options.clientId;
    await db().insert(carerLink).values({
      clientId,
      carerUserId: userId,
      carerName: name,
      carerEmail: email,
      relationship: "Friend",
      consentSource: "client",
      consentMethod: "in-app",
      consentRecordedById: userId,
    });
  }
  const actor: Actor = { userId, name, email, role, organizationId: clinic.organizationId, clinicName: clinic.clinicName, clientId };
  return actor;
}
