import type { PlacedElectrode } from "./rule-helpers";
import { PLACEMENT_DEFER, PLACEMENT_SOURCES } from "./sources";
import type { PlacementFinding } from "./types";
import { MIN_MARKER_SPACING_CM, unitsToCm } from "./view-box";

/** Centre-to-centre distance on the drawing, in rough centimetres; null when the markers are in different views. */
export function markerSpacingCm(placed: readonly PlacedElectrode[]): number | null {
  const [a, b] = placed;
  if (!a || !b || a.marker.view !== b.marker.view) return null;
  return unitsToCm(Math.hypot(a.marker.x - b.marker.x, a.marker.y - b.marker.y));
}

// The drawing is only roughly to scale and markers stand for electrode centres, so this asks for a check on the
// body; lib/stim's `electrodes-too-close` judges the spacing the therapist measures.
export function spacingFindings(placed: readonly PlacedElectrode[]): PlacementFinding[] {
  const spacing = markerSpacingCm(placed);
  if (spacing === null || spacing >= MIN_MARKER_SPACING_CM) return [];
  const rounded = Math.round(spacing * 10) / 10;
  return [{
    code: "placement-markers-close",
    severity: "warning",
    title: "These two markers are very close",
    explanation:
      (spacing === 0
        ? "Both markers are on the same spot of the drawing. "
        : `The markers are about ${rounded.toLocaleString("en-GB")} cm apart on the drawing, centre to centre. `) +
      `Check the spacing on the body: closer than about ${MIN_MARKER_SPACING_CM} cm (three finger-widths), the ` +
      "current tends to flow through the skin between the electrodes rather than through the muscle, and they " +
      `must never touch. The drawing is only roughly to scale. ${PLACEMENT_DEFER}`,
    source: PLACEMENT_SOURCES.spacing,
    numbers: { markerSpacingCm: rounded },
    electrodes: [0, 1],
  }];
}
