import type { ElectrodeIndex, Marker, MarkerPair, Zone } from "./types";
import { markerZone } from "./zone-lookup";
import { ELECTRODE_LETTERS } from "./sources";

/** One electrode of the channel with its zone worked out (null off the body). */
export interface PlacedElectrode {
  index: ElectrodeIndex;
  marker: Marker;
  zone: Zone | null;
}

export function placedElectrodes(markers: MarkerPair): PlacedElectrode[] {
  return markers.flatMap((marker, i) =>
    marker ? [{ index: i as ElectrodeIndex, marker, zone: markerZone(marker) }] : [],
  );
}

/** "Electrode A", "Electrodes A and B". */
export function electrodeWords(indexes: readonly ElectrodeIndex[]): string {
  const letters = indexes.map((i) => ELECTRODE_LETTERS[i]);
  return letters.length === 1 ? `Electrode ${letters[0]}` : `Electrodes ${letters.join(" and ")}`;
}

/** "is" or "are", to agree with electrodeWords. */
export const verb = (indexes: readonly ElectrodeIndex[]) => (indexes.length === 1 ? "is" : "are");

export const LIMB_REGIONS = new Set(["shoulder", "upper-arm", "forearm", "hand-wrist"]);
