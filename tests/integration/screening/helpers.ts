import { and, eq } from "drizzle-orm";
import { expect } from "vitest";
import { db } from "@/db/client";
import { auditEvent, redFlagClearance, screening } from "@/db/schema";
import { AppError } from "@/lib/errors";
import type { ScreeningFormValues } from "@/lib/screening/schema";
import { createClinic, createPerson } from "../../support/factories";
import { cleanAnswers, withPrecautions } from "../../unit/screening/answers-fixture";

export { cleanAnswers, withPrecautions };

export async function expectAppError(promise: Promise<unknown>, code: AppError["code"]) {
  const error = await promise.then(
    () => null,
    (caught: unknown) => caught,
  );
  expect(error).toBeInstanceOf(AppError);
  expect((error as AppError).code).toBe(code);
  return error as AppError;
}

// A clinic with a therapist and one client of theirs; every test builds its own so files run in parallel.
export async function clinicWithClient() {
  const clinic = await createClinic("Screening clinic");
  const therapist = await createPerson(clinic, "therapist");
  const client = await createPerson(clinic, "client", { therapistId: therapist.userId });
  return { clinic, therapist, client, clientId: client.clientId! };
}

export function withPacemaker(answers: ScreeningFormValues = cleanAnswers()): ScreeningFormValues {
  return withPrecautions({ ...answers, redFlags: { ...answers.redFlags, activeImplant: "yes" } }, "Await the cardiologist's clearance.");
}

export async function screeningsOf(clientId: string) {
  return db().select().from(screening).where(eq(screening.clientId, clientId)).orderBy(screening.version);
}

export async function clearancesOf(screeningId: string) {
  return db().select().from(redFlagClearance).where(eq(redFlagClearance.screeningId, screeningId));
}

export async function auditOf(entityId: string, action: string) {
  return db().select().from(auditEvent).where(and(eq(auditEvent.entityId, entityId), eq(auditEvent.action, action)));
}
