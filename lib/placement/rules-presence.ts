import { electrodeWords, verb, type PlacedElectrode } from "./rule-helpers";
import { PLACEMENT_SOURCES } from "./sources";
import type { ElectrodeIndex, MarkerPair, PlacementFinding } from "./types";

// A channel's current flows from one electrode to the other, so the record must say where both go.
export function presenceFindings(markers: MarkerPair, placed: readonly PlacedElectrode[]): PlacementFinding[] {
  const out: PlacementFinding[] = [];
  const missing = ([0, 1] as const).filter((i) => markers[i] === null);
  if (missing.length > 0) {
    out.push({
      code: "placement-marker-missing",
      severity: "blocks",
      title: missing.length === 2 ? "No electrodes placed yet" : "One electrode not placed yet",
      explanation:
        `${electrodeWords(missing)} ${missing.length === 1 ? "has" : "have"} not been placed. Place both ` +
        "electrodes of the channel on the body outline, so the client and the handout show where each one goes.",
      source: PLACEMENT_SOURCES.commonPractice,
      electrodes: missing,
    });
  }
  const offBody: ElectrodeIndex[] = placed.filter((e) => e.zone === null).map((e) => e.index);
  if (offBody.length > 0) {
    out.push({
      code: "placement-off-body",
      severity: "blocks",
      title: "An electrode is off the body",
      explanation: `${electrodeWords(offBody)} ${verb(offBody)} outside the body outline. Place both electrodes on the body.`,
      source: PLACEMENT_SOURCES.commonPractice,
      electrodes: offBody,
    });
  }
  return out;
}
