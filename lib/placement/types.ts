import type { Finding } from "@/lib/stim";

export const VIEWS = ["front", "back"] as const;
/** `front`: the client faces the viewer (their left is on the viewer's right). `back`: seen from behind. */
export type View = (typeof VIEWS)[number];

/** Always the client's own side, never the viewer's. */
export type Side = "left" | "right" | "midline";

export type Region =
  | "head"
  | "neck"
  | "chest"
  | "abdomen"
  | "shoulder"
  | "upper-arm"
  | "forearm"
  | "hand-wrist"
  | "back";

/** A point in a view's drawing units (see `VIEW_BOX`). */
export type Point = readonly [x: number, y: number];

export interface Zone {
  /** Stable and kebab-case: safe to store, test and link against. */
  id: string;
  view: View;
  /** Plain words for the therapist and the client; starts with a capital. */
  label: string;
  side: Side;
  region: Region;
  /** A simple polygon in the view's drawing units; neighbouring zones share their edges exactly. */
  points: readonly Point[];
}

/** Where one electrode's centre goes on the drawing. Its zone is derived, never stored. */
export interface Marker {
  view: View;
  x: number;
  y: number;
}

/** A channel has exactly two electrodes, A and B; `null` until placed. */
export type MarkerPair = readonly [Marker | null, Marker | null];

export type ElectrodeIndex = 0 | 1;

export type PlacementFindingCode =
  | "placement-marker-missing"
  | "placement-off-body"
  | "placement-head"
  | "placement-front-neck"
  | "placement-across-chest"
  | "placement-chest-front-to-back"
  | "placement-across-arms"
  | "placement-across-midline"
  | "placement-near-front-neck"
  | "placement-back-neck"
  | "placement-on-chest"
  | "placement-markers-close";

/**
 * The same shape as lib/stim's findings, with placement codes. lib/stim's `FindingCode` is a closed union, so the
 * code is widened here rather than there; `electrodes` says which marker(s) a finding is about.
 */
export type PlacementFinding = Omit<Finding, "code" | "field"> & {
  code: PlacementFindingCode;
  electrodes?: readonly ElectrodeIndex[];
};
