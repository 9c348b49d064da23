import { interiorPoint, pointInPolygon } from "./polygon";
import type { Marker, View, Zone } from "./types";
import { ZONES } from "./zones";

const BY_ID = new Map(ZONES.map((zone) => [zone.id, zone]));

export const zonesForView = (view: View): readonly Zone[] => ZONES.filter((zone) => zone.view === view);

export const zoneById = (id: string): Zone | undefined => BY_ID.get(id);

/** A zone's plain label, for callers that hold the zone rather than its label (diffs, handouts). */
export const zoneLabel = (zone: Zone): string => zone.label;

/** The zone a point of a view falls in, or null off the body. Zones do not overlap, so there is at most one. */
export function zoneAt(view: View, x: number, y: number): Zone | null {
  if (!Number.isFinite(x) || !Number.isFinite(y)) return null;
  return ZONES.find((zone) => zone.view === view && pointInPolygon(x, y, zone.points)) ?? null;
}

export const markerZone = (marker: Marker): Zone | null => zoneAt(marker.view, marker.x, marker.y);

/** A marker well inside a zone: where "place on this zone" puts an electrode before it is fine-tuned. */
export function markerInZone(zoneId: string): Marker {
  const zone = zoneById(zoneId);
  if (!zone) throw new Error(`Unknown zone: ${zoneId}`);
  const [x, y] = interiorPoint(zone.points);
  return { view: zone.view, x: Math.round(x), y: Math.round(y) };
}
