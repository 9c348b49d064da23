import "server-only";
import type { Database } from "@/db/client";
import { getLatestScreeningByClientId, listRedFlagClearancesByScreeningIds } from "@/db/queries/screenings";
import { gateReasons, summariseScreening, type ScreeningSummary } from "./summary";

export type PublishingGate = { ok: boolean; reasons: string[]; latest: ScreeningSummary | null };

// Whether the client's screening lets a programme be published. Only the latest signed version counts: an older
// red flag that a later screening no longer records does not block. The caller has already checked who is asking;
// a publishing command may pass its transaction as `executor` to run the check on the same connection.
export async function getPublishingGate(clientId: string, executor?: Database): Promise<PublishingGate> {
  const row = await getLatestScreeningByClientId(clientId, executor);
  const latest = row ? summariseScreening(row, await listRedFlagClearancesByScreeningIds([row.screening.id], executor)) : null;
  const reasons = gateReasons(latest);
  return { ok: reasons.length === 0, reasons, latest };
}
