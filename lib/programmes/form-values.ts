import {
  toChannelSettingsInput,
  toNumber,
  twoInchRound,
  type ChannelSettingsFormValues,
  type ElectrodeValues,
} from "@/lib/forms/channel-settings-values";
import type { ElectrodeTypeId } from "./labels";
import type { MarkerValue, ProgrammeContent } from "./content";
import { DEFAULT_ELECTRODE_CARE, DEFAULT_SKIN_PREPARATION, STANDARD_CAUTIONS } from "./defaults";

// What the programme builder's form holds: text as typed, so a half-finished draft can be saved as it is. The
// strict shape (content.ts) is only required when publishing.

export type ChannelFormValues = {
  id: string;
  target: string;
  side: "left" | "right" | "";
  electrodeType: ElectrodeTypeId | "";
  markers: [MarkerValue | null, MarkerValue | null];
  placementNote: string;
  photoIds: string[];
  settings: ChannelSettingsFormValues;
};

export type StepValue = { text: string };

export type ProgrammeFormValues = {
  channels: ChannelFormValues[];
  schedule: { minutesPerSession: string; sessionsPerDay: string; daysPerWeek: string; weeks: string; reviewOn: string; replaceElectrodesAfterUses?: string };
  skinPreparation: StepValue[];
  electrodeCare: StepValue[];
  ownCautions: StepValue[];
};

export const emptySettings = (): ChannelSettingsFormValues => ({
  frequencyHz: "",
  phaseDurationUs: "",
  waveform: { kind: "symmetric-biphasic", interphaseGapUs: "", secondPhaseAmplitudeMa: "", secondPhaseDurationUs: "" },
  rampUpS: "",
  holdS: "",
  rampDownS: "",
  restS: "",
  amplitudeCeilingMa: "",
  electrodes: [twoInchRound(), twoInchRound()],
  interElectrodeSpacingCm: "",
});

export function newChannelId(existing: { id: string }[]): string {
  let n = existing.length + 1;
  while (existing.some((channel) => channel.id === `ch-${n}`)) n++;
  return `ch-${n}`;
}

export function emptyChannel(existing: { id: string }[] = []): ChannelFormValues {
  return {
    id: newChannelId(existing),
    target: "",
    side: "",
    electrodeType: "standard-gel",
    markers: [null, null],
    placementNote: "",
    photoIds: [],
    settings: emptySettings(),
  };
}

export function addWeeks(from: Date, weeks: number): string {
  const date = new Date(from.getTime() + weeks * 7 * 24 * 60 * 60 * 1000);
  return date.toISOString().slice(0, 10);
}

export function emptyProgramme(today = new Date()): ProgrammeFormValues {
  return {
    channels: [emptyChannel()],
    // 20 uses before a new pack is a cautious default to adjust to the electrode maker's guidance (from memory, unverified).
    schedule: { minutesPerSession: "30", sessionsPerDay: "1", daysPerWeek: "5", weeks: "6", reviewOn: addWeeks(today, 2), replaceElectrodesAfterUses: "20" },
    skinPreparation: DEFAULT_SKIN_PREPARATION.map((text) => ({ text })),
    electrodeCare: DEFAULT_ELECTRODE_CARE.map((text) => ({ text })),
    ownCautions: [],
  };
}

const str = (value: number | undefined | null) => (value === undefined || value === null ? "" : String(value));

function electrodeValues(electrode: ProgrammeContent["channels"][number]["settings"]["electrodes"][number]): ElectrodeValues {
  const base = { ...twoInchRound(), unit: electrode.unit };
  if (electrode.shape === "round") return { ...base, shape: "round", diameter: str(electrode.diameter) };
  if (electrode.shape === "square") return { ...base, shape: "square", side: str(electrode.side) };
  return { ...base, shape: "rectangle", width: str(electrode.width), length: str(electrode.length) };
}

/** A published version's content back into the builder's form, to start the next version from it. */
export function contentToFormValues(content: ProgrammeContent): ProgrammeFormValues {
  return {
    channels: content.channels.map((channel) => {
      const s = channel.settings;
      const w = s.waveform;
      return {
        id: channel.id,
        target: channel.target,
        side: channel.side,
        electrodeType: channel.electrodeType,
        markers: [channel.markers[0], channel.markers[1]],
        placementNote: channel.placementNote ?? "",
        photoIds: [...channel.photoIds],
        settings: {
          frequencyHz: str(s.frequencyHz),
          phaseDurationUs: str(s.phaseDurationUs),
          waveform: {
            kind: w.kind,
            interphaseGapUs: w.kind === "monophasic" ? "" : str(w.interphaseGapUs),
            secondPhaseAmplitudeMa: w.kind === "asymmetric-balanced-biphasic" ? str(w.secondPhaseAmplitudeMa) : "",
            secondPhaseDurationUs: w.kind === "asymmetric-balanced-biphasic" ? str(w.secondPhaseDurationUs) : "",
          },
          rampUpS: str(s.rampUpS),
          holdS: str(s.holdS),
          rampDownS: str(s.rampDownS),
          restS: str(s.restS),
          amplitudeCeilingMa: str(s.amplitudeCeilingMa),
          electrodes: [electrodeValues(s.electrodes[0]), electrodeValues(s.electrodes[1])],
          interElectrodeSpacingCm: str(s.interElectrodeSpacingCm),
        },
      };
    }),
    schedule: {
      minutesPerSession: str(content.schedule.minutesPerSession),
      sessionsPerDay: str(content.schedule.sessionsPerDay),
      daysPerWeek: str(content.schedule.daysPerWeek),
      weeks: str(content.schedule.weeks),
      reviewOn: content.schedule.reviewOn,
      replaceElectrodesAfterUses: str(content.schedule.replaceElectrodesAfterUses),
    },
    skinPreparation: content.skinPreparation.map((text) => ({ text })),
    electrodeCare: content.electrodeCare.map((text) => ({ text })),
    ownCautions: content.ownCautions.map((text) => ({ text })),
  };
}

const steps = (values: StepValue[]) => values.map((step) => step.text.trim()).filter((text) => text.length > 0);

/** The builder's values in the JSON shape of a published programme, before strict validation. */
export function formValuesToContentInput(values: ProgrammeFormValues): unknown {
  return {
    channels: values.channels.map((channel) => ({
      id: channel.id,
      target: channel.target,
      side: channel.side === "" ? undefined : channel.side,
      electrodeType: channel.electrodeType === "" ? undefined : channel.electrodeType,
      markers: channel.markers[0] && channel.markers[1] ? [channel.markers[0], channel.markers[1]] : undefined,
      placementNote: channel.placementNote.trim() === "" ? undefined : channel.placementNote,
      photoIds: channel.photoIds,
      settings: toChannelSettingsInput(channel.settings),
    })),
    schedule: {
      minutesPerSession: toNumber(values.schedule.minutesPerSession),
      sessionsPerDay: toNumber(values.schedule.sessionsPerDay),
      daysPerWeek: toNumber(values.schedule.daysPerWeek),
      weeks: toNumber(values.schedule.weeks),
      reviewOn: values.schedule.reviewOn || undefined,
      replaceElectrodesAfterUses: toNumber(values.schedule.replaceElectrodesAfterUses),
    },
    skinPreparation: steps(values.skinPreparation),
    electrodeCare: steps(values.electrodeCare),
    standardCautions: STANDARD_CAUTIONS,
    ownCautions: steps(values.ownCautions),
  };
}
