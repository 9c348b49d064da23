import { cycleAveragedRmsMa, deriveCycle, type CycleDerived } from "./cycle";
import {
  SHANNON_K_LABEL,
  amplitudeForCurrentDensityMa,
  averagePowerMw,
  chargeDensityUcPerCm2,
  currentDensityMaPerCm2,
  energyPerPhaseMj,
  powerDensityMwPerCm2,
  shannonK,
} from "./dose";
import { electrodeAreaCm2 } from "./electrodes";
import {
  averageAbsoluteCurrentMa,
  interphaseGapUs,
  netChargeUc,
  phaseChargeUc,
  pulsePeriodUs,
  pulsePhases,
  pulseWidthUs,
  rmsCurrentMa,
} from "./pulse";
import type { ChannelSettings } from "./schema";
import { deriveSession, type SessionDerived } from "./session";

/** One phase at the amplitude ceiling. */
export interface PhaseDerived {
  /** Signed current, mA (negative: the reversed phase). */
  currentMa: number;
  durationUs: number;
  chargeUc: number;
  /** Into the 500 Ω reference load, mJ. */
  energyMj: number;
}

/** Everything computed for one channel, at its amplitude ceiling (the most the client may turn up to). */
export interface ChannelDerived {
  /** The first phase's amplitude the figures are computed at: the amplitude ceiling, mA. */
  amplitudeMa: number;
  pulse: {
    periodUs: number;
    /** Phases plus interphase gap, µs. */
    pulseWidthUs: number;
    /** Period minus pulse width, µs; zero or negative means the pulses touch or overlap. */
    gapBetweenPulsesUs: number;
    phases: PhaseDerived[];
    /** First phase's charge, µC. */
    phaseChargeUc: number;
    maxPhaseChargeUc: number;
    netChargeUc: number;
  };
  current: {
    /** During the pulse train, mA. */
    rmsTrainMa: number;
    /** Over the cycle with the ramps left out: I_rms·sqrt(hold/(hold+rest)), mA. */
    rmsCycleRampsIgnoredMa: number | null;
    /** Over the cycle with the ramps counted at full intensity (an upper bound), mA. */
    rmsCycleRampsAsOnMa: number | null;
    averageAbsoluteMa: number;
  };
  electrodes: { areasCm2: number[]; smallestAreaCm2: number };
  dose: {
    /** During the train, into 500 Ω, mW. */
    averagePowerMw: number;
    maxEnergyPerPhaseMj: number;
    energyPerPulseMj: number;
    /** Train r.m.s. on the smallest electrode, mA/cm². */
    currentDensityMaPerCm2: number;
    /** Largest phase charge on the smallest electrode, µC/cm². */
    chargeDensityUcPerCm2: number;
    /** Train power on the smallest electrode, mW/cm². */
    powerDensityMwPerCm2: number;
    shannon: { k: number; label: string };
    /**
     * Highest first-phase amplitude keeping the density at or below 2 mA/cm², mA; an asymmetric second phase
     * is taken to scale with it (see `withAmplitudeCeiling`).
     */
    amplitudeAtDensityLimitMa: number;
  };
  cycle: CycleDerived;
  session: SessionDerived;
}

export function deriveChannel(s: ChannelSettings): ChannelDerived {
  const amplitudeMa = s.amplitudeCeilingMa;
  const phases = pulsePhases(s);
  const periodUs = pulsePeriodUs(s.frequencyHz);
  const widthUs = pulseWidthUs(phases, interphaseGapUs(s.waveform));
  const phaseDetails = phases.map((p) => ({
    ...p,
    chargeUc: phaseChargeUc(p.currentMa, p.durationUs),
    energyMj: energyPerPhaseMj(p.currentMa, p.durationUs),
  }));
  const maxPhaseChargeUc = Math.max(...phaseDetails.map((p) => p.chargeUc));
  const rmsTrainMa = rmsCurrentMa(phases, s.frequencyHz);
  const areasCm2 = s.electrodes.map(electrodeAreaCm2);
  const smallestAreaCm2 = Math.min(...areasCm2);
  const chargeDensity = chargeDensityUcPerCm2(maxPhaseChargeUc, smallestAreaCm2);
  const powerMw = averagePowerMw(rmsTrainMa);
  const cycle = deriveCycle(s);
  return {
    amplitudeMa,
    pulse: {
      periodUs,
      pulseWidthUs: widthUs,
      gapBetweenPulsesUs: periodUs - widthUs,
      phases: phaseDetails,
      phaseChargeUc: phaseDetails[0]?.chargeUc ?? 0,
      maxPhaseChargeUc,
      netChargeUc: netChargeUc(phases),
    },
    current: {
      rmsTrainMa,
      rmsCycleRampsIgnoredMa: cycleAveragedRmsMa(rmsTrainMa, s.holdS, s.restS),
      rmsCycleRampsAsOnMa: cycleAveragedRmsMa(rmsTrainMa, cycle.onTimeWithRampsS, s.restS),
      averageAbsoluteMa: averageAbsoluteCurrentMa(phases, s.frequencyHz),
    },
    electrodes: { areasCm2, smallestAreaCm2 },
    dose: {
      averagePowerMw: powerMw,
      maxEnergyPerPhaseMj: Math.max(...phaseDetails.map((p) => p.energyMj)),
      energyPerPulseMj: phaseDetails.reduce((sum, p) => sum + p.energyMj, 0),
      currentDensityMaPerCm2: currentDensityMaPerCm2(rmsTrainMa, smallestAreaCm2),
      chargeDensityUcPerCm2: chargeDensity,
      powerDensityMwPerCm2: powerDensityMwPerCm2(powerMw, smallestAreaCm2),
      shannon: { k: shannonK(chargeDensity, maxPhaseChargeUc), label: SHANNON_K_LABEL },
      amplitudeAtDensityLimitMa: amplitudeForCurrentDensityMa(rmsTrainMa, amplitudeMa, smallestAreaCm2),
    },
    cycle,
    session: deriveSession(s),
  };
}
