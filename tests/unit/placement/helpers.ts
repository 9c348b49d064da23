import { expect } from "vitest";
import {
  markerInZone,
  placementFindings,
  type Marker,
  type MarkerPair,
  type PlacementFinding,
  type PlacementFindingCode,
  type Point,
} from "@/lib/placement";

/** A marker well inside the named zone. */
export const at = (zoneId: string): Marker => markerInZone(zoneId);

export const pair = (a: Marker | null, b: Marker | null): MarkerPair => [a, b];

export const codesFor = (a: Marker | null, b: Marker | null): PlacementFindingCode[] =>
  placementFindings([a, b]).map((f) => f.code);

export function findingFor(a: Marker | null, b: Marker | null, code: PlacementFindingCode): PlacementFinding {
  const finding = placementFindings([a, b]).find((f) => f.code === code);
  expect(finding, `expected ${code}`).toBeDefined();
  return finding!;
}

function segmentsCross([a, b]: [Point, Point], [c, d]: [Point, Point]): boolean {
  const cross = (p: Point, q: Point, r: Point) => (q[0] - p[0]) * (r[1] - p[1]) - (q[1] - p[1]) * (r[0] - p[0]);
  const d1 = cross(c, d, a);
  const d2 = cross(c, d, b);
  const d3 = cross(a, b, c);
  const d4 = cross(a, b, d);
  return d1 * d2 < 0 && d3 * d4 < 0;
}

/** No two edges that do not share a vertex cross each other. */
export function isSimplePolygon(points: readonly Point[]): boolean {
  const n = points.length;
  const edge = (i: number): [Point, Point] => [points[i]!, points[(i + 1) % n]!];
  for (let i = 0; i < n; i++) {
    for (let j = i + 2; j < n; j++) {
      if (i === 0 && j === n - 1) continue;
      if (segmentsCross(edge(i), edge(j))) return false;
    }
  }
  return true;
}
