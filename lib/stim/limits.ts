/**
 * Input limits the schema enforces. They are deliberately wide: they reject what cannot be a stimulation
 * setting at all (zero, negative, absurdly large) and leave everything a device could be set to, so that the
 * findings, not the schema, judge settings that are possible but unwise or mutually impossible (for example a
 * phase duration that fills the pulse period must pass here to produce the "pulses-overlap" finding).
 */
export const SETTINGS_LIMITS = {
  frequencyHz: { min: 0, minInclusive: false, max: 10_000 },
  phaseDurationUs: { min: 0, minInclusive: false, max: 100_000 },
  interphaseGapUs: { min: 0, minInclusive: true, max: 100_000 },
  secondPhaseAmplitudeMa: { min: 0, minInclusive: false, max: 200 },
  secondPhaseDurationUs: { min: 0, minInclusive: false, max: 100_000 },
  rampS: { min: 0, minInclusive: true, max: 60 },
  holdS: { min: 0, minInclusive: true, max: 3_600 },
  restS: { min: 0, minInclusive: true, max: 3_600 },
  amplitudeCeilingMa: { min: 0, minInclusive: false, max: 200 },
  sessionMinutes: { min: 0, minInclusive: false, max: 240 },
  sessionsPerDay: { min: 1, minInclusive: true, max: 12 },
  daysPerWeek: { min: 1, minInclusive: true, max: 7 },
  /** Any electrode dimension, after conversion to cm. */
  electrodeDimensionCm: { min: 0, minInclusive: false, max: 50 },
  interElectrodeSpacingCm: { min: 0, minInclusive: true, max: 100 },
} as const;
