import { twoInchRound, type ChannelSettingsFormValues, type ElectrodeValues } from "@/lib/forms/channel-settings-values";
import { emptyChannel, emptyProgramme, type ChannelFormValues, type ProgrammeFormValues } from "./form-values";

// Rampline's own starting points, built from the trade's usual ranges (common practice, no published source;
// 30 Hz and 250 µs for shoulder support is also the most common setting in Ito et al. 2023). Each is a starting
// point to adjust for the client; the amplitude ceiling in particular is a placeholder to set after the in-clinic
// test stimulation.

export type BuiltInTemplate = { id: string; name: string; description: string; channels: Omit<ChannelFormValues, "id">[] };

const round = (inches: string): ElectrodeValues => ({ ...twoInchRound(), diameter: inches });
const square = (inches: string): ElectrodeValues => ({ ...twoInchRound(), shape: "square", side: inches });

function settings(values: Partial<ChannelSettingsFormValues> & Pick<ChannelSettingsFormValues, "frequencyHz" | "phaseDurationUs">): ChannelSettingsFormValues {
  return {
    waveform: { kind: "symmetric-biphasic", interphaseGapUs: "", secondPhaseAmplitudeMa: "", secondPhaseDurationUs: "" },
    rampUpS: "1",
    holdS: "5",
    rampDownS: "1",
    restS: "25",
    amplitudeCeilingMa: "30",
    electrodes: [round("2"), round("2")],
    interElectrodeSpacingCm: "",
    ...values,
  };
}

function channel(target: string, values: ChannelSettingsFormValues): Omit<ChannelFormValues, "id"> {
  const { id: _unused, ...blank } = emptyChannel();
  void _unused;
  return { ...blank, target, settings: values };
}

export const BUILT_IN_TEMPLATES: BuiltInTemplate[] = [
  {
    id: "wrist-finger-extension",
    name: "Wrist and finger extension",
    description: "Forearm extensors, for opening the hand. 35 Hz, 300 µs, 1 s ramps, 5 s hold, 25 s rest (about 1:5 early on).",
    channels: [channel("Wrist and finger extensors", settings({ frequencyHz: "35", phaseDurationUs: "300" }))],
  },
  {
    id: "shoulder-support",
    name: "Shoulder support",
    description: "Supraspinatus and posterior deltoid, for a shoulder at risk of subluxation. 30 Hz, 250 µs, 2 s ramps, 10 s hold, 20 s rest.",
    channels: [
      channel(
        "Shoulder support (supraspinatus and posterior deltoid)",
        settings({ frequencyHz: "30", phaseDurationUs: "250", rampUpS: "2", holdS: "10", rampDownS: "2", restS: "20", electrodes: [square("2"), square("2")] }),
      ),
    ],
  },
  {
    id: "thumb-abduction",
    name: "Thumb abduction",
    description: "The small thumb muscles, with small electrodes. 35 Hz, 200 µs to limit overflow, 1 s ramps, 4 s hold, 20 s rest.",
    channels: [
      channel(
        "Thumb abduction (abductor pollicis brevis)",
        settings({ frequencyHz: "35", phaseDurationUs: "200", holdS: "4", restS: "20", amplitudeCeilingMa: "20", electrodes: [round("1.25"), round("1.25")] }),
      ),
    ],
  },
  {
    id: "grasp-and-release",
    name: "Grasp and release (two channels)",
    description: "Flexors then extensors of the forearm, for practising grasp and release. 35 Hz, 300 µs on both channels.",
    channels: [
      channel("Wrist and finger flexors", settings({ frequencyHz: "35", phaseDurationUs: "300" })),
      channel("Wrist and finger extensors", settings({ frequencyHz: "35", phaseDurationUs: "300" })),
    ],
  },
];

/** A new programme's form values from a template: a built-in one or a clinic's saved one. */
export function programmeFromTemplate(channels: Omit<ChannelFormValues, "id">[], today = new Date()): ProgrammeFormValues {
  const base = emptyProgramme(today);
  const withIds: ChannelFormValues[] = [];
  for (const value of channels) withIds.push({ ...structuredClone(value), id: `ch-${withIds.length + 1}` });
  return { ...base, channels: withIds };
}
