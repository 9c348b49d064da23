import { zoneAt, zoneLabel } from "@/lib/placement";
import type { MarkerValue } from "./content";

// A marker in words, as the diff and the handout say it: the named zone it falls in.
export function zoneLabelForMarker(marker: MarkerValue): string {
  const zone = zoneAt(marker.view, marker.x, marker.y);
  return zone ? zoneLabel(zone) : "off the body outline";
}
