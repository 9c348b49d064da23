import { CURRENT_DENSITY_ATTENTION_MA_PER_CM2 } from "./thresholds";
import { REFERENCE_LOAD_OHMS, jToMj, maToA, usToS, wToMw } from "./units";

/** Current density, mA/cm²: I / A (pass an r.m.s. current and the smallest electrode's area). */
export function currentDensityMaPerCm2(currentMa: number, areaCm2: number): number {
  return currentMa / areaCm2;
}

/** Charge density per phase, µC/cm²: Q / A. */
export function chargeDensityUcPerCm2(chargeUc: number, areaCm2: number): number {
  return chargeUc / areaCm2;
}

/** Average power into the load, mW: I_rms²·R (R defaults to the 500 Ω reference load). */
export function averagePowerMw(rmsMa: number, loadOhms = REFERENCE_LOAD_OHMS): number {
  return wToMw(maToA(rmsMa) ** 2 * loadOhms);
}

/** Power density, mW/cm²: P / A. */
export function powerDensityMwPerCm2(powerMw: number, areaCm2: number): number {
  return powerMw / areaCm2;
}

/** Energy delivered by one phase into the load, mJ: I²·R·t. */
export function energyPerPhaseMj(amplitudeMa: number, durationUs: number, loadOhms = REFERENCE_LOAD_OHMS): number {
  return jToMj(maToA(amplitudeMa) ** 2 * loadOhms * usToS(durationUs));
}

/** Shown beside Shannon's k wherever it appears. */
export const SHANNON_K_LABEL =
  "Information only: derived from implanted electrodes on brain tissue, not a skin limit.";

/**
 * Shannon (1992) k = log10(D) + log10(Q), D in µC/cm² per phase, Q in µC per phase (dimensionless).
 * Information only: the model comes from implanted electrodes on brain tissue and is no limit for skin.
 */
export function shannonK(chargeDensityUcPerCm2: number, chargeUc: number): number {
  return Math.log10(chargeDensityUcPerCm2) + Math.log10(chargeUc);
}

/**
 * The highest amplitude, mA, that keeps current density at or below `limit` (default 2 mA/cm²) on an
 * electrode of `areaCm2`, given the r.m.s. current `rmsMa` produced at `amplitudeMa`. r.m.s. current is
 * proportional to amplitude, so one computed point fixes the line.
 */
export function amplitudeForCurrentDensityMa(
  rmsMa: number,
  amplitudeMa: number,
  areaCm2: number,
  limit = CURRENT_DENSITY_ATTENTION_MA_PER_CM2,
): number {
  return (limit * areaCm2 * amplitudeMa) / rmsMa;
}
