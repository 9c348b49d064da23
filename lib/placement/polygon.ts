import { MIDLINE_X } from "./view-box";
import type { Point } from "./types";

/**
 * Even-odd ray casting with half-open edges, so a point on an edge two zones share belongs to exactly one of them.
 */
export function pointInPolygon(x: number, y: number, points: readonly Point[]): boolean {
  let inside = false;
  for (let i = 0, j = points.length - 1; i < points.length; j = i++) {
    const [xi, yi] = points[i]!;
    const [xj, yj] = points[j]!;
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

/** Shoelace area; positive or negative with the winding, so callers take its size. */
export function signedArea(points: readonly Point[]): number {
  let sum = 0;
  for (let i = 0, j = points.length - 1; i < points.length; j = i++) {
    sum += points[j]![0] * points[i]![1] - points[i]![0] * points[j]![1];
  }
  return sum / 2;
}

export const mirrorPoint = ([x, y]: Point): Point => [2 * MIDLINE_X - x, y];
export const mirrorPolygon = (points: readonly Point[]): Point[] => points.map(mirrorPoint);

/** A half outline running from the midline round to the midline again, completed by its mirror image. */
export function symmetricPolygon(half: readonly Point[]): Point[] {
  const otherHalf = mirrorPolygon(half).reverse().filter(([x]) => x !== MIDLINE_X);
  return [...half, ...otherHalf];
}

function distanceToSegment(x: number, y: number, [ax, ay]: Point, [bx, by]: Point): number {
  const dx = bx - ax;
  const dy = by - ay;
  const lengthSq = dx * dx + dy * dy;
  const t = lengthSq === 0 ? 0 : Math.max(0, Math.min(1, ((x - ax) * dx + (y - ay) * dy) / lengthSq));
  return Math.hypot(x - (ax + t * dx), y - (ay + t * dy));
}

/** 0 inside the polygon, else the distance to its nearest edge. */
export function distanceToPolygon(x: number, y: number, points: readonly Point[]): number {
  if (pointInPolygon(x, y, points)) return 0;
  let best = Infinity;
  for (let i = 0, j = points.length - 1; i < points.length; j = i++) {
    best = Math.min(best, distanceToSegment(x, y, points[j]!, points[i]!));
  }
  return best;
}

/**
 * A point well inside the polygon (where a marker placed "on this zone" goes): the middle of the widest run of
 * the horizontal line through the vertical middle. The centroid alone can fall outside a bent shape.
 */
export function interiorPoint(points: readonly Point[]): Point {
  const ys = points.map(([, y]) => y);
  const y = (Math.min(...ys) + Math.max(...ys)) / 2 + 0.25;
  const crossings: number[] = [];
  for (let i = 0, j = points.length - 1; i < points.length; j = i++) {
    const [xi, yi] = points[i]!;
    const [xj, yj] = points[j]!;
    if (yi > y !== yj > y) crossings.push(((xj - xi) * (y - yi)) / (yj - yi) + xi);
  }
  crossings.sort((a, b) => a - b);
  let best: Point = points[0]!;
  let widest = -1;
  for (let k = 0; k + 1 < crossings.length; k += 2) {
    const width = crossings[k + 1]! - crossings[k]!;
    if (width > widest) [widest, best] = [width, [(crossings[k]! + crossings[k + 1]!) / 2, y]];
  }
  return best;
}
