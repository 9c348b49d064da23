import type { ProgrammeChannel, ProgrammeContent } from "./content";
import { ELECTRODE_TYPE_LABELS, SIDE_LABELS, WAVEFORM_LABELS } from "./labels";

// A readable list of what changed between two published versions, e.g. "Pulse duration, channel 1: 300 µs → 250 µs".
export type Change = { area: string; label: string; before: string; after: string };

const n = (value: number | undefined, unit: string) => (value === undefined ? "none" : `${value.toLocaleString("en-GB")} ${unit}`);

type Electrode = ProgrammeChannel["settings"]["electrodes"][number];
type Marker = ProgrammeChannel["markers"][number];
function electrodeWords(e: Electrode): string {
  const unit = e.unit === "in" ? "in" : "cm";
  if (e.shape === "round") return `round, ${e.diameter} ${unit} across`;
  if (e.shape === "square") return `square, ${e.side} ${unit}`;
  return `rectangle, ${e.width} × ${e.length} ${unit}`;
}

function channelFields(c: ProgrammeChannel, zoneName: (m: Marker) => string): [string, string][] {
  const s = c.settings;
  const w = s.waveform;
  return [
    ["Target", c.target],
    ["Side", SIDE_LABELS[c.side]],
    ["Electrode type", ELECTRODE_TYPE_LABELS[c.electrodeType]],
    ["Electrode A", electrodeWords(s.electrodes[0])],
    ["Electrode B", electrodeWords(s.electrodes[1])],
    ["Electrode A position", zoneName(c.markers[0])],
    ["Electrode B position", zoneName(c.markers[1])],
    ["Placement note", c.placementNote ?? "none"],
    ["Placement photos", String(c.photoIds.length)],
    ["Frequency", n(s.frequencyHz, "Hz")],
    ["Pulse duration", n(s.phaseDurationUs, "µs")],
    ["Waveform", WAVEFORM_LABELS[w.kind]],
    ["Interphase gap", n(w.kind === "monophasic" ? undefined : w.interphaseGapUs, "µs")],
    ["Second phase amplitude", n(w.kind === "asymmetric-balanced-biphasic" ? w.secondPhaseAmplitudeMa : undefined, "mA")],
    ["Second phase duration", n(w.kind === "asymmetric-balanced-biphasic" ? w.secondPhaseDurationUs : undefined, "µs")],
    ["Ramp-up", n(s.rampUpS, "s")],
    ["Hold", n(s.holdS, "s")],
    ["Ramp-down", n(s.rampDownS, "s")],
    ["Rest", n(s.restS, "s")],
    ["Amplitude ceiling", n(s.amplitudeCeilingMa, "mA")],
    ["Electrode spacing", n(s.interElectrodeSpacingCm, "cm")],
  ];
}

function compareFields(area: string, before: [string, string][], after: [string, string][], changes: Change[]) {
  const old = new Map(before);
  for (const [label, value] of after) {
    const previous = old.get(label);
    if (previous !== undefined && previous !== value) changes.push({ area, label, before: previous, after: value });
  }
}

function compareLists(area: string, label: string, before: string[], after: string[], changes: Change[]) {
  for (const item of after) if (!before.includes(item)) changes.push({ area, label: `${label} added`, before: "", after: item });
  for (const item of before) if (!after.includes(item)) changes.push({ area, label: `${label} removed`, before: item, after: "" });
}

export function diffProgrammes(
  before: ProgrammeContent,
  after: ProgrammeContent,
  zoneName: (marker: Marker) => string = (m) => `${m.view} (${Math.round(m.x)}, ${Math.round(m.y)})`,
): Change[] {
  const changes: Change[] = [];
  const channelName = (content: ProgrammeContent, id: string) => `Channel ${content.channels.findIndex((c) => c.id === id) + 1}`;
  for (const channel of after.channels) {
    const old = before.channels.find((c) => c.id === channel.id);
    const area = channelName(after, channel.id);
    if (!old) {
      changes.push({ area, label: "Channel added", before: "", after: channel.target });
      continue;
    }
    compareFields(area, channelFields(old, zoneName), channelFields(channel, zoneName), changes);
  }
  for (const channel of before.channels) {
    if (!after.channels.some((c) => c.id === channel.id)) {
      changes.push({ area: channelName(before, channel.id), label: "Channel removed", before: channel.target, after: "" });
    }
  }
  const schedule = (c: ProgrammeContent): [string, string][] => [
    ["Minutes per session", String(c.schedule.minutesPerSession)],
    ["Sessions per day", String(c.schedule.sessionsPerDay)],
    ["Days per week", String(c.schedule.daysPerWeek)],
    ["Weeks", String(c.schedule.weeks)],
    ["Review date", c.schedule.reviewOn],
    ["New electrodes after", c.schedule.replaceElectrodesAfterUses === undefined ? "not set" : `${c.schedule.replaceElectrodesAfterUses} uses`],
  ];
  compareFields("Schedule", schedule(before), schedule(after), changes);
  compareLists("Skin preparation", "Step", before.skinPreparation, after.skinPreparation, changes);
  compareLists("Electrode care", "Step", before.electrodeCare, after.electrodeCare, changes);
  compareLists("Cautions", "Caution", [...before.standardCautions, ...before.ownCautions], [...after.standardCautions, ...after.ownCautions], changes);
  return changes;
}

/** "Pulse duration, channel 1: 300 µs → 250 µs" */
export function describeChange(change: Change): string {
  const where = change.area.startsWith("Channel") ? `, ${change.area.toLowerCase()}` : ` (${change.area.toLowerCase()})`;
  if (change.label === "Channel added") return `${change.area} added: ${change.after}`;
  if (change.label === "Channel removed") return `${change.area} removed: ${change.before}`;
  if (change.label.endsWith(" added")) return `${change.label}${where}: ${change.after}`;
  if (change.label.endsWith(" removed")) return `${change.label}${where}: ${change.before}`;
  return `${change.label}${where}: ${change.before} → ${change.after}`;
}
