import type { BodyRegion, Waveform } from "@/lib/stim";

// What a channel-settings form holds (the explorer's, and each channel of the programme builder): the raw strings of its number inputs, as typed. `toChannelInput` turns them
// into the JSON shape analyseChannel reads, so the analysis (not the form) decides what is valid.

export type ElectrodeShape = "round" | "square" | "rectangle";
export type ElectrodeValues = { shape: ElectrodeShape; diameter: string; side: string; width: string; length: string; unit: "cm" | "in" };
export type WaveformValues = {
  kind: Waveform["kind"];
  interphaseGapUs: string;
  secondPhaseAmplitudeMa: string;
  secondPhaseDurationUs: string;
};

/** One channel's own settings: what the programme builder keeps per channel. */
export interface ChannelSettingsFormValues {
  frequencyHz: string;
  phaseDurationUs: string;
  waveform: WaveformValues;
  rampUpS: string;
  holdS: string;
  rampDownS: string;
  restS: string;
  amplitudeCeilingMa: string;
  electrodes: [ElectrodeValues, ElectrodeValues];
  interElectrodeSpacingCm: string;
}

/** The explorer's whole form: a channel plus the schedule and context the builder keeps elsewhere. */
export interface SettingsFormValues extends ChannelSettingsFormValues {
  sessionMinutes: string;
  sessionsPerDay: string;
  daysPerWeek: string;
  bodyRegion: BodyRegion | "";
  earlyProgramme: boolean;
}

export const twoInchRound = (): ElectrodeValues => ({ shape: "round", diameter: "2", side: "2", width: "2", length: "4", unit: "in" });

/**
 * An example starting point, not a recommendation: the middle of the trade's usual ranges (common practice, no
 * published source) for frequency, pulse duration, ramps, hold, rest, electrodes and session length. The
 * amplitude ceiling and the asymmetric second phase are invented example values.
 */
export const EXAMPLE_VALUES: SettingsFormValues = {
  frequencyHz: "35",
  phaseDurationUs: "300",
  waveform: { kind: "symmetric-biphasic", interphaseGapUs: "", secondPhaseAmplitudeMa: "10", secondPhaseDurationUs: "1200" },
  rampUpS: "1",
  holdS: "5",
  rampDownS: "1",
  restS: "20",
  amplitudeCeilingMa: "40",
  sessionMinutes: "30",
  sessionsPerDay: "1",
  daysPerWeek: "5",
  electrodes: [twoInchRound(), twoInchRound()],
  interElectrodeSpacingCm: "",
  bodyRegion: "forearm",
  earlyProgramme: false,
};

/** A blank box is "not entered" (so the message asks for it); anything else is a number or left as typed. */
export function toNumber(raw: string | undefined): number | string | undefined {
  const text = (raw ?? "").trim();
  if (text === "") return undefined;
  const n = Number(text);
  return Number.isFinite(n) ? n : text;
}

function electrodeInput(e: ElectrodeValues) {
  if (e.shape === "round") return { shape: e.shape, diameter: toNumber(e.diameter), unit: e.unit };
  if (e.shape === "square") return { shape: e.shape, side: toNumber(e.side), unit: e.unit };
  return { shape: e.shape, width: toNumber(e.width), length: toNumber(e.length), unit: e.unit };
}

function waveformInput(w: WaveformValues) {
  if (w.kind === "monophasic") return { kind: w.kind };
  const gap = toNumber(w.interphaseGapUs);
  if (w.kind === "symmetric-biphasic") return { kind: w.kind, interphaseGapUs: gap };
  return { kind: w.kind, secondPhaseAmplitudeMa: toNumber(w.secondPhaseAmplitudeMa), secondPhaseDurationUs: toNumber(w.secondPhaseDurationUs), interphaseGapUs: gap };
}

/** A channel's own settings in the JSON shape lib/stim reads; optional fields left blank are left out. */
export function toChannelSettingsInput(v: ChannelSettingsFormValues): Record<string, unknown> {
  return {
    frequencyHz: toNumber(v.frequencyHz),
    phaseDurationUs: toNumber(v.phaseDurationUs),
    waveform: waveformInput(v.waveform),
    rampUpS: toNumber(v.rampUpS),
    holdS: toNumber(v.holdS),
    rampDownS: toNumber(v.rampDownS),
    restS: toNumber(v.restS),
    amplitudeCeilingMa: toNumber(v.amplitudeCeilingMa),
    electrodes: v.electrodes.map(electrodeInput),
    interElectrodeSpacingCm: toNumber(v.interElectrodeSpacingCm),
  };
}

/** The explorer's values as analyseChannel's input; optional fields left blank are left out. */
export function toChannelInput(v: SettingsFormValues): Record<string, unknown> {
  return {
    ...toChannelSettingsInput(v),
    sessionMinutes: toNumber(v.sessionMinutes),
    sessionsPerDay: toNumber(v.sessionsPerDay),
    daysPerWeek: toNumber(v.daysPerWeek),
    bodyRegion: v.bodyRegion === "" ? undefined : v.bodyRegion,
    earlyProgramme: v.earlyProgramme,
  };
}

const SIZE_FIELDS: Record<ElectrodeShape, Array<keyof ElectrodeValues>> = {
  round: ["diameter"],
  square: ["side"],
  rectangle: ["width", "length"],
};

/** The field paths the form shows for these values: an error on any other path is shown above the form. */
export function shownFieldPaths(v: SettingsFormValues): string[] {
  const paths = ["frequencyHz", "phaseDurationUs", "waveform.kind", "rampUpS", "holdS", "rampDownS", "restS", "amplitudeCeilingMa"];
  paths.push("sessionMinutes", "sessionsPerDay", "daysPerWeek", "interElectrodeSpacingCm", "bodyRegion", "earlyProgramme");
  if (v.waveform.kind !== "monophasic") paths.push("waveform.interphaseGapUs");
  if (v.waveform.kind === "asymmetric-balanced-biphasic") paths.push("waveform.secondPhaseAmplitudeMa", "waveform.secondPhaseDurationUs");
  v.electrodes.forEach((e, i) => {
    paths.push(`electrodes.${i}.shape`, `electrodes.${i}.unit`, ...SIZE_FIELDS[e.shape].map((k) => `electrodes.${i}.${k}`));
  });
  return paths;
}

/** Messages whose field is not on the form (the input as a whole, say), to show once above it. */
export function unplacedErrors(fieldErrors: Record<string, string>, v: SettingsFormValues): string[] {
  const shown = new Set(shownFieldPaths(v));
  return Object.entries(fieldErrors)
    .filter(([path]) => !shown.has(path))
    .map(([, message]) => message);
}
