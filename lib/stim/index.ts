export { analyseChannel, findingsForChannel, type ChannelAnalysis } from "./analyse";
export {
  FREQUENCY_BANDS,
  PULSE_DURATION_BANDS,
  frequencyBand,
  pulseDurationBand,
  type Band,
  type FrequencyBandId,
  type PulseDurationBandId,
} from "./bands";
export { cycleAveragedRmsMa, cycleLengthS, deriveCycle, onTimeWithRampsS, type CycleDerived, type CycleSettings } from "./cycle";
export { deriveChannel, type ChannelDerived, type PhaseDerived } from "./derive";
export {
  SHANNON_K_LABEL,
  amplitudeForCurrentDensityMa,
  averagePowerMw,
  chargeDensityUcPerCm2,
  currentDensityMaPerCm2,
  energyPerPhaseMj,
  powerDensityMwPerCm2,
  shannonK,
} from "./dose";
export { electrodeAreaCm2, smallestElectrodeAreaCm2 } from "./electrodes";
export { SEVERITY_ORDER, sortFindings, type Finding, type FindingCode, type Severity } from "./findings/types";
export { SOURCES } from "./findings/sources";
export { SETTINGS_LIMITS } from "./limits";
export { ROOT_FIELD, parseChannelSettings, toFieldErrors, type FieldErrors, type ParseResult } from "./parse";
export {
  averageAbsoluteCurrentMa,
  interphaseGapUs,
  netChargeUc,
  phaseChargeUc,
  pulsePeriodUs,
  pulsePhases,
  pulseWidthUs,
  rmsCurrentMa,
  withAmplitudeCeiling,
  type Phase,
  type PulseSettings,
} from "./pulse";
export {
  bodyRegions,
  channelSettingsSchema,
  waveformSchema,
  type BodyRegion,
  type ChannelSettings,
  type ChannelSettingsInput,
  type Waveform,
} from "./schema";
export { electrodePairSchema, electrodeSchema, type Electrode } from "./schema-electrodes";
export { deriveSession, type SessionDerived, type SessionSettings } from "./session";
export * from "./thresholds";
export { CM_PER_INCH, REFERENCE_LOAD_OHMS, toCm, type LengthUnit } from "./units";
