import type { ChannelDerived } from "@/lib/stim";
import { formatFigure, formatRatio, formatShare, withUnit } from "./format";

export type FigureGroupId = "pulse" | "current-charge" | "density-power" | "cycle-session" | "dose";
export interface FigureRow {
  id: string;
  label: string;
  /** Ready to show, unit included. */
  value: string;
  explanation: string;
}
export interface FigureGroup {
  id: FigureGroupId;
  title: string;
  rows: FigureRow[];
}

const row = (id: string, label: string, value: string, explanation: string): FigureRow => ({ id, label, value, explanation });
const seconds = (s: number) => withUnit(s, "s", { maxFractionDigits: 2 });
const minutes = (m: number) => withUnit(m, "min", { maxFractionDigits: 1 });

function pulseRows(d: ChannelDerived): FigureRow[] {
  const p = d.pulse;
  return [
    row("period", "Pulse period", withUnit(p.periodUs, "µs"), "From the start of one pulse to the start of the next: 1 ÷ frequency."),
    row("pulse-width", "Pulse width", withUnit(p.pulseWidthUs, "µs"), "How long one pulse lasts: all its phases plus any interphase gap."),
    row("gap-between", "Gap between pulses", withUnit(p.gapBetweenPulsesUs, "µs"), "Period minus pulse width. Zero or less means the pulses run into each other."),
  ];
}

function currentRows(d: ChannelDerived): FigureRow[] {
  const { pulse: p, current: c } = d;
  const rows = [
    row("amplitude", "Amplitude the figures use", withUnit(d.amplitudeMa, "mA"), "The amplitude ceiling: the most the client may turn up to, so every figure here is the worst case."),
    row("phase-charge", "Charge per phase", withUnit(p.phaseChargeUc, "µC"), "Current × duration of the first phase (1 mA for 1 µs is 1 nC)."),
  ];
  if (Math.abs(p.maxPhaseChargeUc - p.phaseChargeUc) > 1e-9 * p.maxPhaseChargeUc) {
    rows.push(row("max-phase-charge", "Largest phase charge", withUnit(p.maxPhaseChargeUc, "µC"), "The larger phase's charge, which the charge density uses."));
  }
  rows.push(
    row("net-charge", "Net charge per pulse", withUnit(p.netChargeUc, "µC"), "The phases' charges with their signs, added up: zero when the pulse is balanced."),
    row("rms-train", "r.m.s. current during the pulse train", withUnit(c.rmsTrainMa, "mA"), "The root-mean-square current while pulses are being delivered."),
    row("rms-cycle-ignored", "r.m.s. over the cycle, ramps left out", withUnit(c.rmsCycleRampsIgnoredMa, "mA"), "Train r.m.s. × √(hold ÷ (hold + rest))."),
    row("rms-cycle-as-on", "r.m.s. over the cycle, ramps counted as on", withUnit(c.rmsCycleRampsAsOnMa, "mA"), "As if the ramps ran at full amplitude: an upper bound."),
    row("average-current", "Average current (size only)", withUnit(c.averageAbsoluteMa, "mA"), "The average of the current's size during the pulse train."),
  );
  return rows;
}

function densityRows(d: ChannelDerived): FigureRow[] {
  const areas = d.electrodes.areasCm2.map((a, i) =>
    row(`area-${i + 1}`, `Area of electrode ${i + 1}`, withUnit(a, "cm²"), "Conductive area from the shape and size entered; densities use the smaller electrode."),
  );
  const { dose } = d;
  return [
    ...areas,
    row("current-density", "Current density", withUnit(dose.currentDensityMaPerCm2, "mA/cm²"), "Train r.m.s. on the smaller electrode. IEC 60601-2-10 asks for special attention above 2 mA/cm²."),
    row("amplitude-at-limit", "Amplitude giving 2 mA/cm²", withUnit(dose.amplitudeAtDensityLimitMa, "mA"), "The highest amplitude that keeps the current density at or below 2 mA/cm² on the smaller electrode."),
    row("charge-density", "Charge density per phase", withUnit(dose.chargeDensityUcPerCm2, "µC/cm²"), "The largest phase charge on the smaller electrode."),
    row("average-power", "Average power into 500 Ω", withUnit(dose.averagePowerMw, "mW"), "Train r.m.s. squared × 500 Ω, the reference load regulators use."),
    row("power-density", "Power density", withUnit(dose.powerDensityMwPerCm2, "mW/cm²"), "Average power on the smaller electrode; a summary of FDA guidance gives 250 mW/cm² (0.25 W/cm²) to stay below."),
  ];
}

function cycleRows(d: ChannelDerived): FigureRow[] {
  const { cycle: c, session: s } = d;
  return [
    row("cycle-length", "Cycle length", seconds(c.cycleLengthS), "Ramp-up + hold + ramp-down + rest."),
    row("on-with-ramps", "On time, ramps counted", seconds(c.onTimeWithRampsS), "Ramp-up + hold + ramp-down: how some devices count the on time."),
    row("on-hold-only", "On time at the set amplitude", seconds(c.onTimeHoldOnlyS), "The hold only: how other devices count the on time."),
    row("ratio-with-ramps", "On : rest, ramps counted", formatRatio(c.restPerOnWithRamps), "Rest per second of on time, counting the ramps as on."),
    row("ratio-hold-only", "On : rest, hold only", formatRatio(c.restPerOnHoldOnly), "Rest per second of hold."),
    row("share-ignored", "Duty cycle, ramps left out", formatShare(c.onShareRampsIgnored), "Hold ÷ (hold + rest)."),
    row("share-as-on", "Duty cycle, ramps counted", formatShare(c.onShareRampsAsOn), "(Ramp-up + hold + ramp-down) ÷ cycle."),
    row("contractions", "Contractions per session", formatFigure(s.contractionsPerSession), "Complete contractions, each finished with its ramp-down; the session starts with a ramp-up."),
    row("stimulated-minutes", "Minutes with current flowing, per session", minutes(s.stimulatedMinutesPerSession), `${formatShare(s.stimulatedShareOfSession)} of the session, ramps included.`),
    row("full-minutes", "Minutes at the set amplitude, per session", minutes(s.fullIntensityMinutesPerSession), `${formatShare(s.fullIntensityShareOfSession)} of the session: the holds only.`),
  ];
}

function doseRows(d: ChannelDerived): FigureRow[] {
  const { dose, session } = d;
  return [
    row("energy-per-phase", "Energy of the largest phase", withUnit(dose.maxEnergyPerPhaseMj, "mJ"), "Current² × 500 Ω × duration. A limit of 300 mJ per pulse is attributed to an earlier edition of IEC 60601-2-10."),
    row("energy-per-pulse", "Energy per pulse", withUnit(dose.energyPerPulseMj, "mJ"), "All the phases of one pulse, into 500 Ω."),
    row("sessions-per-week", "Sessions per week", formatFigure(session.sessionsPerWeek), "Sessions per day × days per week."),
    row("full-minutes-week", "Minutes at the set amplitude, per week", minutes(session.fullIntensityMinutesPerWeek), "Hold time across every session of the week."),
    row("shannon-k", "Shannon k (information only)", formatFigure(dose.shannon.k), `${dose.shannon.label} k = log₁₀ charge density + log₁₀ charge per phase.`),
  ];
}

/** The derived figures in the five groups the picture shows, each figure explained in plain words. */
export function figureGroups(derived: ChannelDerived): FigureGroup[] {
  return [
    { id: "pulse", title: "Pulse", rows: pulseRows(derived) },
    { id: "current-charge", title: "Current and charge", rows: currentRows(derived) },
    { id: "density-power", title: "Density and power", rows: densityRows(derived) },
    { id: "cycle-session", title: "Cycle and session", rows: cycleRows(derived) },
    { id: "dose", title: "Dose", rows: doseRows(derived) },
  ];
}
