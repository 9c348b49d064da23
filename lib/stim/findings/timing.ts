import type { CycleSettings } from "../cycle";
import { interphaseGapUs, pulsePeriodUs, pulsePhases, pulseWidthUs } from "../pulse";
import type { ChannelSettings } from "../schema";
import { LIMIT_TOLERANCE } from "../units";
import { fmt } from "./format";
import { DEFER, SOURCES } from "./sources";
import type { Finding } from "./types";

export type PulseTimingSettings = Pick<ChannelSettings, "frequencyHz" | "phaseDurationUs" | "waveform">;

/** Blocks when one pulse (phases plus interphase gap) fills or overruns the period 1/f. */
export function pulseTimingFindings(p: PulseTimingSettings): Finding[] {
  // Width does not depend on amplitude, so any ceiling will do here.
  const widthUs = pulseWidthUs(pulsePhases({ ...p, amplitudeCeilingMa: 1 }), interphaseGapUs(p.waveform));
  const periodUs = pulsePeriodUs(p.frequencyHz);
  if (widthUs < periodUs * (1 - LIMIT_TOLERANCE)) return [];
  const maxFrequencyHz = 1_000_000 / widthUs;
  return [
    {
      code: "pulses-overlap",
      severity: "blocks",
      title: widthUs > periodUs ? "Pulses overlap" : "No gap between pulses",
      explanation:
        `Each pulse lasts ${fmt(widthUs)} µs but at ${fmt(p.frequencyHz)} Hz a new pulse starts every ` +
        `${fmt(periodUs)} µs, so the pulses ${widthUs > periodUs ? "overlap" : "run into each other"}. ` +
        `No stimulator can deliver this. Lower the frequency below ${fmt(maxFrequencyHz)} Hz or shorten ` +
        `the phases, then check the result against the device's specification.`,
      source: SOURCES.arithmetic,
      numbers: { pulseWidthUs: widthUs, periodUs, maxFrequencyHz },
    },
  ];
}

/**
 * On-time rules. The on phase is ramp-up + hold + ramp-down. "Ramps longer than the on time" is read as the
 * ramps taking the whole on phase, i.e. ramps set with no hold: the amplitude is never held at its set level.
 */
export function cycleFindings(c: CycleSettings): Finding[] {
  const ramps = c.rampUpS + c.rampDownS;
  if (ramps + c.holdS <= 0) {
    return [
      {
        code: "on-time-zero",
        severity: "blocks",
        title: "No on time",
        explanation:
          "Ramp-up, hold and ramp-down are all zero, so this channel would never stimulate. Enter the " +
          "hold time (and ramps, if used) as set on the device.",
        source: SOURCES.arithmetic,
        numbers: { onTimeS: 0 },
      },
    ];
  }
  if (c.holdS <= 0) {
    return [
      {
        code: "ramps-exceed-on-time",
        severity: "blocks",
        title: "Ramps take the whole on time",
        explanation:
          `The ramps (${fmt(c.rampUpS)} s up, ${fmt(c.rampDownS)} s down) fill the whole on time with no ` +
          "hold, so the set amplitude is never held. If the device counts its on time including the " +
          "ramps, enter the hold as that on time minus the ramps.",
        source: SOURCES.commonPractice,
        numbers: { rampUpS: c.rampUpS, rampDownS: c.rampDownS, holdS: c.holdS },
      },
    ];
  }
  if (ramps > c.holdS * (1 + LIMIT_TOLERANCE)) {
    return [
      {
        code: "ramps-longer-than-hold",
        severity: "note",
        title: "Ramps longer than the hold",
        explanation:
          `The ramps together (${fmt(ramps)} s) last longer than the hold (${fmt(c.holdS)} s), so most of ` +
          "each contraction is spent turning up or down. Ramps of about 1–2 s are usual; shorter or none " +
          `when stimulation should arrive at once during a task. ${DEFER}`,
        source: SOURCES.commonPractice,
        numbers: { rampsS: ramps, holdS: c.holdS },
      },
    ];
  }
  return [];
}
