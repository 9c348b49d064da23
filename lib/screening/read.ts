import "server-only";
import {
  getScreeningByClientIdAndVersion,
  getScreeningByIdAndClientId,
  listRedFlagClearancesByScreeningIds,
  listScreeningsByClientId,
} from "@/db/queries/screenings";
import type { Screening } from "@/db/schema";
import type { Actor } from "@/lib/auth/actor";
import { requireClientAccess } from "@/lib/auth/access";
import { forbidden, notFound } from "@/lib/errors";
import type { AnswersDraft } from "./rules";
import { summariseScreening, type ScreeningSummary } from "./summary";

// Screenings are the clinic's working record: the clinician's answers and judgement. Clinic staff (admins and
// therapists of the client's clinic) read them; clients and carers do not (403) and see the cautions that matter to
// them in their programme instead. A copy for the client comes through the clinic's data export.
async function requireStaffAccess(actor: Actor, clientId: string) {
  if (actor.role !== "therapist" && actor.role !== "admin") throw forbidden();
  return requireClientAccess(actor, clientId);
}

export type ScreeningVersion = ScreeningSummary & { answers: AnswersDraft };

export async function listScreeningsForClient(actor: Actor, clientId: string): Promise<ScreeningSummary[]> {
  const { client } = await requireStaffAccess(actor, clientId);
  const rows = await listScreeningsByClientId(client.id);
  const clearances = await listRedFlagClearancesByScreeningIds(rows.map((row) => row.screening.id));
  return rows.map((row) => summariseScreening(row, clearances));
}

export async function getScreeningVersion(actor: Actor, clientId: string, key: { id: string } | { version: number }): Promise<ScreeningVersion> {
  const { client } = await requireStaffAccess(actor, clientId);
  const row =
    "id" in key ? await getScreeningByIdAndClientId(key.id, client.id) : await getScreeningByClientIdAndVersion(client.id, key.version);
  if (!row) throw notFound("That screening");
  return withAnswers(row, await listRedFlagClearancesByScreeningIds([row.screening.id]));
}

function withAnswers(row: { screening: Screening; signedByName: string }, clearances: Parameters<typeof summariseScreening>[1]) {
  return { ...summariseScreening(row, clearances), answers: row.screening.answers as AnswersDraft };
}
