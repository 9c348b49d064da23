import type { ChannelSettings } from "./schema";
import { aToMa, cToUc, maToA, sToUs, usToS } from "./units";

/** One phase of a pulse: signed current (mA; negative is the reversed phase) and duration (µs). */
export interface Phase {
  currentMa: number;
  durationUs: number;
}

export type PulseSettings = Pick<ChannelSettings, "phaseDurationUs" | "waveform" | "amplitudeCeilingMa">;

/**
 * The phases of one pulse with the first phase at `amplitudeMa` (default: the amplitude ceiling). The second
 * phase of an asymmetric waveform scales in proportion, because a device turns the whole pulse up together.
 */
export function pulsePhases(pulse: PulseSettings, amplitudeMa = pulse.amplitudeCeilingMa): Phase[] {
  const first: Phase = { currentMa: amplitudeMa, durationUs: pulse.phaseDurationUs };
  const w = pulse.waveform;
  switch (w.kind) {
    case "monophasic":
      return [first];
    case "symmetric-biphasic":
      return [first, { currentMa: -amplitudeMa, durationUs: pulse.phaseDurationUs }];
    case "asymmetric-balanced-biphasic":
      return [
        first,
        {
          currentMa: -w.secondPhaseAmplitudeMa * (amplitudeMa / pulse.amplitudeCeilingMa),
          durationUs: w.secondPhaseDurationUs,
        },
      ];
  }
}

/** Interphase gap of the waveform in µs (0 for monophasic or when not given). */
export function interphaseGapUs(waveform: ChannelSettings["waveform"]): number {
  return waveform.kind === "monophasic" ? 0 : (waveform.interphaseGapUs ?? 0);
}

/** Time from one pulse's start to the next, in µs: 1/f. */
export function pulsePeriodUs(frequencyHz: number): number {
  return sToUs(1 / frequencyHz);
}

/** Time one pulse occupies, in µs: all its phases plus the interphase gap. */
export function pulseWidthUs(phases: readonly Phase[], gapUs = 0): number {
  return phases.reduce((sum, p) => sum + p.durationUs, 0) + (phases.length > 1 ? gapUs : 0);
}

/** Charge of one phase, in µC: Q = I·t (1 mA for 1 µs is 1 nC). Sign is dropped: a phase's charge is a size. */
export function phaseChargeUc(amplitudeMa: number, durationUs: number): number {
  return cToUc(Math.abs(maToA(amplitudeMa)) * usToS(durationUs));
}

/** Net charge per pulse, in µC: Σ signed I_k·t_k (zero for a balanced biphasic pulse). */
export function netChargeUc(phases: readonly Phase[]): number {
  return cToUc(phases.reduce((sum, p) => sum + maToA(p.currentMa) * usToS(p.durationUs), 0));
}

/** r.m.s. current during the pulse train, in mA: sqrt(f·Σ I_k²·t_k). The interphase gap carries no current. */
export function rmsCurrentMa(phases: readonly Phase[], frequencyHz: number): number {
  const sumI2t = phases.reduce((sum, p) => sum + maToA(p.currentMa) ** 2 * usToS(p.durationUs), 0);
  return aToMa(Math.sqrt(frequencyHz * sumI2t));
}

/** Average absolute current during the pulse train, in mA: f·Σ |I_k|·t_k. */
export function averageAbsoluteCurrentMa(phases: readonly Phase[], frequencyHz: number): number {
  const sumIt = phases.reduce((sum, p) => sum + Math.abs(maToA(p.currentMa)) * usToS(p.durationUs), 0);
  return aToMa(frequencyHz * sumIt);
}

/**
 * The same pulse shape at another amplitude ceiling (mA): an asymmetric waveform's second-phase amplitude,
 * which is entered as its value at the ceiling, scales in proportion. Other waveforms only change the ceiling.
 */
export function withAmplitudeCeiling<T extends PulseSettings>(settings: T, ceilingMa: number): T {
  const w = settings.waveform;
  if (w.kind !== "asymmetric-balanced-biphasic") return { ...settings, amplitudeCeilingMa: ceilingMa };
  const secondPhaseAmplitudeMa = w.secondPhaseAmplitudeMa * (ceilingMa / settings.amplitudeCeilingMa);
  return { ...settings, amplitudeCeilingMa: ceilingMa, waveform: { ...w, secondPhaseAmplitudeMa } };
}
