import type { ChannelDerived } from "../derive";
import type { ChannelSettings } from "../schema";
import {
  CURRENT_DENSITY_ATTENTION_MA_PER_CM2,
  ENERGY_PER_PULSE_LIMIT_MJ,
  POWER_DENSITY_LIMIT_MW_PER_CM2,
} from "../thresholds";
import { exceeds } from "../units";
import { fmt } from "./format";
import { DEFER, SOURCES } from "./sources";
import type { Finding } from "./types";

/** Density and output warnings, all judged at the amplitude ceiling on the smallest electrode. */
export function densityFindings(s: ChannelSettings, d: ChannelDerived): Finding[] {
  const out: Finding[] = [];
  const area = d.electrodes.smallestAreaCm2;
  const density = d.dose.currentDensityMaPerCm2;
  if (exceeds(density, CURRENT_DENSITY_ATTENTION_MA_PER_CM2)) {
    out.push({
      code: "current-density-high",
      severity: "warning",
      title: "Current density above 2 mA/cm²",
      explanation:
        `At the amplitude ceiling of ${fmt(s.amplitudeCeilingMa)} mA the r.m.s. current density on the ` +
        `smaller electrode (${fmt(area)} cm²) is ${fmt(density, 2)} mA/cm². The standard for these ` +
        "stimulators asks that current densities above 2 mA/cm² be given special attention. The density " +
        `reaches 2 mA/cm² at about ${fmt(d.dose.amplitudeAtDensityLimitMa)} mA; a larger electrode or a ` +
        `lower ceiling keeps it below. Watch the skin under this electrode closely. ${DEFER}`,
      source: SOURCES.iecCurrentDensity,
      numbers: {
        currentDensityMaPerCm2: density,
        smallestAreaCm2: area,
        amplitudeCeilingMa: s.amplitudeCeilingMa,
        amplitudeAtDensityLimitMa: d.dose.amplitudeAtDensityLimitMa,
      },
    });
  }
  const powerDensity = d.dose.powerDensityMwPerCm2;
  if (exceeds(powerDensity, POWER_DENSITY_LIMIT_MW_PER_CM2)) {
    out.push({
      code: "power-density-high",
      severity: "warning",
      title: "Power density above 0.25 W/cm²",
      explanation:
        `At the amplitude ceiling the average power into 500 Ω is ${fmt(d.dose.averagePowerMw, 0)} mW, ` +
        `${fmt(powerDensity / 1000, 3)} W/cm² on the smaller electrode. Guidance for these stimulators ` +
        "gives 0.25 W/cm² as the level to stay below to limit the risk of a thermal burn. A larger " +
        `electrode or a lower ceiling reduces it. ${DEFER}`,
      source: SOURCES.fdaPowerDensity,
      numbers: { powerDensityMwPerCm2: powerDensity, averagePowerMw: d.dose.averagePowerMw, smallestAreaCm2: area },
    });
  }
  const energy = d.dose.energyPerPulseMj;
  if (exceeds(energy, ENERGY_PER_PULSE_LIMIT_MJ)) {
    out.push({
      code: "energy-per-pulse-high",
      severity: "warning",
      title: "Energy per pulse above 300 mJ",
      explanation:
        `At the amplitude ceiling each pulse would deliver ${fmt(energy, 0)} mJ into 500 Ω, above the ` +
        "300 mJ output limit attributed to an earlier edition of the standard. Check the phase duration " +
        `and the ceiling against the device's stated maximum outputs. ${DEFER}`,
      source: SOURCES.iecEnergyPerPulse,
      numbers: { energyPerPulseMj: energy },
    });
  }
  return out;
}
