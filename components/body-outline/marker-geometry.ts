import { UNITS_PER_CM, VIEW_BOX, type Marker } from "@/lib/placement";

/** Drawn size of a marker and the larger, invisible circle that takes the pointer (about 44 px at full width). */
export const MARKER_RADIUS = 12;
export const HIT_RADIUS = 22;

/** Arrow keys move a marker 1 cm on the drawing, Shift with an arrow 5 cm (the scale is rough). */
export const KEY_STEP_UNITS = UNITS_PER_CM;
export const BIG_KEY_STEP_UNITS = 5 * UNITS_PER_CM;

const clamp = (value: number, min: number, max: number) => Math.min(max, Math.max(min, value));

/**
 * Keeps a point inside the view box, inset by a marker's radius, so a marker can never be dragged or stepped
 * out of sight, even in part. No zone comes that close to the edge.
 */
export function clampToView(x: number, y: number): { x: number; y: number } {
  const inset = MARKER_RADIUS;
  return { x: clamp(x, inset, VIEW_BOX.width - inset), y: clamp(y, inset, VIEW_BOX.height - inset) };
}

const DIRECTIONS: Record<string, readonly [number, number]> = {
  ArrowLeft: [-1, 0],
  ArrowRight: [1, 0],
  ArrowUp: [0, -1],
  ArrowDown: [0, 1],
};

/** The marker after an arrow key (on screen: left is the viewer's left), or null for any other key. */
export function stepMarker(marker: Marker, key: string, big: boolean): Marker | null {
  const direction = DIRECTIONS[key];
  if (!direction) return null;
  const step = big ? BIG_KEY_STEP_UNITS : KEY_STEP_UNITS;
  return { view: marker.view, ...clampToView(marker.x + direction[0] * step, marker.y + direction[1] * step) };
}

export interface ScreenRect {
  left: number;
  top: number;
  width: number;
  height: number;
}

/**
 * A pointer position on screen → drawing units, for an SVG drawn with the default `xMidYMid meet`: the view box
 * is scaled to fit and centred, so a box of another shape leaves margins. Null when the SVG has no size.
 */
export function clientToViewBox(clientX: number, clientY: number, rect: ScreenRect): { x: number; y: number } | null {
  const scale = Math.min(rect.width / VIEW_BOX.width, rect.height / VIEW_BOX.height);
  if (!(scale > 0)) return null;
  const offsetX = (rect.width - VIEW_BOX.width * scale) / 2;
  const offsetY = (rect.height - VIEW_BOX.height * scale) / 2;
  return { x: (clientX - rect.left - offsetX) / scale, y: (clientY - rect.top - offsetY) / scale };
}

/** Position as whole percentages of the drawing, for the marker's spoken value. */
export function positionPercent(marker: Marker): { across: number; down: number } {
  return {
    across: Math.round((marker.x / VIEW_BOX.width) * 100),
    down: Math.round((marker.y / VIEW_BOX.height) * 100),
  };
}
