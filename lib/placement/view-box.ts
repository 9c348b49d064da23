import { MIN_ELECTRODE_SPACING_CM } from "@/lib/stim";

/** Both views share one view box; the figure is drawn symmetric about `MIDLINE_X`. */
export const VIEW_BOX = { width: 480, height: 600 } as const;
export const MIDLINE_X = VIEW_BOX.width / 2;

/**
 * Drawing units per centimetre on an adult's body, from memory, unverified: the drawing is built on about 40 cm
 * between the shoulder points and about 110 cm from the top of the head to the fingertips of a hanging arm.
 * Bodies differ, so every distance worked out from it is rough.
 */
export const UNITS_PER_CM = 5;

/** Markers closer than this (centre to centre, on the drawing) are flagged: the rule of thumb is about 3 cm. */
export const MIN_MARKER_SPACING_CM = MIN_ELECTRODE_SPACING_CM;

/**
 * A marker whose centre lies within this distance of the front of the neck is flagged: the common 2 in round
 * electrode has a radius of 2.54 cm, so its edge can reach the neck from here.
 */
export const NEAR_FRONT_NECK_CM = 3;

export const cmToUnits = (cm: number) => cm * UNITS_PER_CM;
export const unitsToCm = (units: number) => units / UNITS_PER_CM;
