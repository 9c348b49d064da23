export { bodyRegionForMarkers } from "./body-region";
export { placementFindings, placementOk, sortPlacementFindings } from "./findings";
export { distanceToPolygon, interiorPoint, mirrorPoint, mirrorPolygon, pointInPolygon, signedArea } from "./polygon";
export { markerSpacingCm } from "./rules-spacing";
export { ELECTRODE_LETTERS, PLACEMENT_DEFER, PLACEMENT_SOURCES } from "./sources";
export {
  VIEWS,
  type ElectrodeIndex,
  type Marker,
  type MarkerPair,
  type PlacementFinding,
  type PlacementFindingCode,
  type Point,
  type Region,
  type Side,
  type View,
  type Zone,
} from "./types";
export {
  MIDLINE_X,
  MIN_MARKER_SPACING_CM,
  NEAR_FRONT_NECK_CM,
  UNITS_PER_CM,
  VIEW_BOX,
  cmToUnits,
  unitsToCm,
} from "./view-box";
export { markerInZone, markerZone, zoneAt, zoneById, zoneLabel, zonesForView } from "./zone-lookup";
export { ZONES } from "./zones";
