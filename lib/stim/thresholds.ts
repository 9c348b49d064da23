/**
 * Figures the findings compare against. Each carries the source the findings cite; DEVELOPERS.md (lib/stim) lists them.
 */

/** IEC 60601-2-10:2012: above this, electrodes "may need the operator's special attention"; read as r.m.s. (secondary). */
export const CURRENT_DENSITY_ATTENTION_MA_PER_CM2 = 2;

/** FDA powered-muscle-stimulator guidance (1999) as summarised by a secondary source: 0.25 W/cm². */
export const POWER_DENSITY_LIMIT_MW_PER_CM2 = 250;

/** Output limit attributed to the earlier edition of IEC 60601-2-10 (secondary): per pulse into 500 Ω. */
export const ENERGY_PER_PULSE_LIMIT_MJ = 300;

/** Common practice: electrodes of one channel about 3 cm (three finger-widths) apart at least. */
export const MIN_ELECTRODE_SPACING_CM = 3;

/** Common practice: on:rest about 1:5 early in a programme. */
export const EARLY_REST_PER_ON = 5;

/** Common practice: above about 300 µs a phase counts as long (overflow risk at the hand and wrist). */
export const LONG_PHASE_US = 300;

/**
 * "Small" for the overflow rule: smaller than a 2 in round electrode (π·(2.54)² ≈ 20.27 cm²), the size the
 * trade calls most common on the arm; the 1.25 in electrodes used for the thumb muscles are well below it.
 */
export const SMALL_ELECTRODE_CM2 = Math.PI * 2.54 * 2.54;
