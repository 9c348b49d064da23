import { SEVERITY_ORDER } from "@/lib/stim";
import { placedElectrodes } from "./rule-helpers";
import { pathFindings } from "./rules-paths";
import { presenceFindings } from "./rules-presence";
import { siteFindings } from "./rules-sites";
import { spacingFindings } from "./rules-spacing";
import type { MarkerPair, PlacementFinding } from "./types";

/** blocks → warning → note; findings of equal severity keep the order they were produced in. */
export function sortPlacementFindings(findings: readonly PlacementFinding[]): PlacementFinding[] {
  return [...findings].sort((a, b) => SEVERITY_ORDER[a.severity] - SEVERITY_ORDER[b.severity]);
}

/**
 * The placement findings for one channel's two markers, sorted. Any finding that blocks means the programme
 * cannot be published as drawn. Path and spacing rules need both electrodes on the body.
 */
export function placementFindings(markers: MarkerPair): PlacementFinding[] {
  const placed = placedElectrodes(markers);
  const onBody = placed.filter((e) => e.zone !== null);
  return sortPlacementFindings([
    ...presenceFindings(markers, placed),
    ...siteFindings(placed),
    ...(onBody.length === 2 ? [...pathFindings(onBody), ...spacingFindings(onBody)] : []),
  ]);
}

/** True when nothing about the placement blocks publishing. */
export const placementOk = (findings: readonly PlacementFinding[]) => findings.every((f) => f.severity !== "blocks");
