import type { BodyRegion } from "@/lib/stim";
import type { MarkerPair, Region } from "./types";
import { markerZone } from "./zone-lookup";

const TO_BODY_REGION: Record<Region, BodyRegion> = {
  "hand-wrist": "hand-wrist",
  forearm: "forearm",
  "upper-arm": "upper-arm",
  shoulder: "shoulder",
  head: "other",
  neck: "other",
  chest: "other",
  abdomen: "other",
  back: "other",
};

/** Most distal first: lib/stim's overflow rule is about the small, close-packed muscles of the hand and wrist. */
const DISTAL_ORDER: readonly BodyRegion[] = ["hand-wrist", "forearm", "upper-arm", "shoulder", "other"];

/**
 * The `bodyRegion` to give lib/stim for a channel: the most distal region either electrode is on, so a channel
 * from the forearm to the hand counts as hand and wrist. Undefined when neither electrode is on the body.
 */
export function bodyRegionForMarkers(markers: MarkerPair): BodyRegion | undefined {
  const regions = markers.flatMap((marker) => {
    const zone = marker ? markerZone(marker) : null;
    return zone ? [TO_BODY_REGION[zone.region]] : [];
  });
  return DISTAL_ORDER.find((region) => regions.includes(region));
}
