import "server-only";
import { getLatestCheckInByClientId } from "@/db/queries/check-ins";
import { countCheckInsSinceByClientId, getLatestElectrodePackByClientId } from "@/db/queries/electrode-packs";
import { packStatus } from "./pack-status";

export async function readPackStatus(clientId: string, replaceAfterUses: number | null) {
  const pack = await getLatestElectrodePackByClientId(clientId);
  const latest = await getLatestCheckInByClientId(clientId);
  const uses = pack ? await countCheckInsSinceByClientId(clientId, pack.openedOn) : 0;
  // A report of lifting edges made before the current pack was recorded is about the old pack.
  const aboutThisPack = latest !== null && (pack === null || latest.createdAt > pack.createdAt);
  const condition = aboutThisPack ? latest.electrodeCondition : null;
  return packStatus({ openedOn: pack?.openedOn ?? null, uses, replaceAfterUses, latestCondition: condition });
}
