import type { ProgrammeChannel, Schedule } from "@/lib/programmes/content";
import { ELECTRODE_TYPE_LABELS, WAVEFORM_LABELS } from "@/lib/programmes/labels";

// The programme in the words a client and carer read on the handout and in the app.

const num = (value: number) => value.toLocaleString("en-GB");
const times = (n: number, one: string, many: string) => (n === 1 ? one : `${num(n)} ${many}`);

export function scheduleInWords(schedule: Schedule): string {
  const perDay = times(schedule.sessionsPerDay, "once a day", "times a day").replace("2 times", "twice");
  return `${num(schedule.minutesPerSession)} minutes, ${perDay}, ${times(schedule.daysPerWeek, "1 day a week", "days a week")}, for ${times(schedule.weeks, "1 week", "weeks")}.`;
}

type Electrode = ProgrammeChannel["settings"]["electrodes"][number];
export function electrodeInWords(e: Electrode): string {
  const unit = e.unit === "in" ? "in" : "cm";
  if (e.shape === "round") return `round, ${num(e.diameter)} ${unit} across`;
  if (e.shape === "square") return `square, ${num(e.side)} ${unit} each side`;
  return `rectangle, ${num(e.width)} × ${num(e.length)} ${unit}`;
}

export function settingsRows(channel: ProgrammeChannel): [string, string][] {
  const s = channel.settings;
  const w = s.waveform;
  const rows: [string, string][] = [
    ["Electrodes", `${ELECTRODE_TYPE_LABELS[channel.electrodeType]}; A ${electrodeInWords(s.electrodes[0])}, B ${electrodeInWords(s.electrodes[1])}`],
    ["Frequency", `${num(s.frequencyHz)} Hz`],
    ["Pulse duration", `${num(s.phaseDurationUs)} µs`],
    ["Waveform", WAVEFORM_LABELS[w.kind]],
  ];
  if (w.kind !== "monophasic" && w.interphaseGapUs !== undefined) rows.push(["Interphase gap", `${num(w.interphaseGapUs)} µs`]);
  if (w.kind === "asymmetric-balanced-biphasic") {
    rows.push(["Second phase", `${num(w.secondPhaseAmplitudeMa)} mA for ${num(w.secondPhaseDurationUs)} µs`]);
  }
  rows.push(
    ["Ramp up", `${num(s.rampUpS)} s`],
    ["On at full strength", `${num(s.holdS)} s`],
    ["Ramp down", `${num(s.rampDownS)} s`],
    ["Rest", `${num(s.restS)} s`],
    ["Strength (amplitude)", `Start at zero and turn up slowly; never above ${num(s.amplitudeCeilingMa)} mA`],
  );
  if (s.interElectrodeSpacingCm !== undefined) rows.push(["Gap between the electrodes", `${num(s.interElectrodeSpacingCm)} cm`]);
  return rows;
}
