/**
 * Unit constants and conversions. `lib/stim` computes in SI (A, s, Ω, W, J, C) and converts to display units
 * (mA, µs, µC, mW, mJ) only at its edges. Areas stay in cm² because every published limit we compare with
 * is per cm².
 */

/** Centimetres in one inch: exact by the 1959 international yard and pound agreement. */
export const CM_PER_INCH = 2.54;

/** The regulators' reference load for output figures, in ohms (Ω). */
export const REFERENCE_LOAD_OHMS = 500;

export type LengthUnit = "cm" | "in";

/** A length in `unit` expressed in centimetres (cm). */
export function toCm(value: number, unit: LengthUnit): number {
  return unit === "in" ? value * CM_PER_INCH : value;
}

/** Milliamperes (mA) → amperes (A). */
export const maToA = (ma: number): number => ma / 1_000;
/** Amperes (A) → milliamperes (mA). */
export const aToMa = (a: number): number => a * 1_000;
/** Microseconds (µs) → seconds (s). */
export const usToS = (us: number): number => us / 1_000_000;
/** Seconds (s) → microseconds (µs). */
export const sToUs = (s: number): number => s * 1_000_000;
/** Coulombs (C) → microcoulombs (µC). */
export const cToUc = (c: number): number => c * 1_000_000;
/** Watts (W) → milliwatts (mW). */
export const wToMw = (w: number): number => w * 1_000;
/** Joules (J) → millijoules (mJ). */
export const jToMj = (j: number): number => j * 1_000;

/**
 * Relative tolerance for comparisons against limits. Inputs typed by people (e.g. 50 mA on 25 cm²) should land
 * exactly on a limit rather than a rounding error above it.
 */
export const LIMIT_TOLERANCE = 1e-9;

/** True when `value` is above `limit` by more than floating-point rounding. */
export function exceeds(value: number, limit: number): boolean {
  return value > limit * (1 + LIMIT_TOLERANCE);
}
