import { z } from "zod";
import { SETTINGS_LIMITS as L } from "./limits";
import { countField, nonNegativeField, positiveField } from "./schema-fields";
import { electrodePairSchema } from "./schema-electrodes";

const gap = nonNegativeField({ label: "interphase gap", unit: "µs" }, L.interphaseGapUs.max).optional();

/**
 * The pulse shape. The first phase always has the channel's amplitude and `phaseDurationUs`. For the
 * asymmetric waveform the second phase's amplitude is the value it takes when the first phase is at the
 * amplitude ceiling; at any other amplitude both phases are taken to scale together.
 */
export const waveformSchema = z.discriminatedUnion(
  "kind",
  [
    z.object({ kind: z.literal("symmetric-biphasic"), interphaseGapUs: gap }),
    z.object({
      kind: z.literal("asymmetric-balanced-biphasic"),
      secondPhaseAmplitudeMa: positiveField(
        { label: "second phase's amplitude", unit: "mA" },
        L.secondPhaseAmplitudeMa.max,
      ),
      secondPhaseDurationUs: positiveField(
        { label: "second phase's duration", unit: "µs" },
        L.secondPhaseDurationUs.max,
      ),
      interphaseGapUs: gap,
    }),
    z.object({ kind: z.literal("monophasic") }),
  ],
  { error: "Choose a waveform: symmetric biphasic, asymmetric balanced biphasic or monophasic." },
);

export const bodyRegions = ["hand-wrist", "forearm", "upper-arm", "shoulder", "other"] as const;

const ramp = (label: string) => nonNegativeField({ label, unit: "s" }, L.rampS.max);

/** One channel's stimulation settings and schedule, as entered by the therapist. */
export const channelSettingsSchema = z.object({
  frequencyHz: positiveField({ label: "frequency", unit: "Hz" }, L.frequencyHz.max),
  phaseDurationUs: positiveField({ label: "phase duration", unit: "µs" }, L.phaseDurationUs.max),
  waveform: waveformSchema,
  rampUpS: ramp("ramp-up time"),
  holdS: nonNegativeField({ label: "hold time", unit: "s" }, L.holdS.max),
  rampDownS: ramp("ramp-down time"),
  restS: nonNegativeField({ label: "rest time", unit: "s" }, L.restS.max),
  amplitudeCeilingMa: positiveField({ label: "amplitude ceiling", unit: "mA" }, L.amplitudeCeilingMa.max),
  sessionMinutes: positiveField({ label: "session length", unit: "minutes" }, L.sessionMinutes.max),
  sessionsPerDay: countField({ label: "number of sessions per day", unit: "sessions" }, L.sessionsPerDay.min, L.sessionsPerDay.max),
  daysPerWeek: countField({ label: "number of days per week", unit: "days" }, L.daysPerWeek.min, L.daysPerWeek.max),
  electrodes: electrodePairSchema,
  /** Edge-to-edge distance between the channel's two electrodes, when it was measured. */
  interElectrodeSpacingCm: nonNegativeField(
    { label: "spacing between the electrodes", unit: "cm" },
    L.interElectrodeSpacingCm.max,
  ).optional(),
  bodyRegion: z
    .enum(bodyRegions, { error: "Choose the body region: hand and wrist, forearm, upper arm, shoulder or other." })
    .optional(),
  /** Set by the caller for the first weeks of a programme; the caller, not this module, decides what "early" is. */
  earlyProgramme: z.boolean({ error: "Say whether this is early in the programme (yes or no)." }).optional(),
}, { error: "The channel's settings are missing or not in the expected form." });

export type ChannelSettings = z.infer<typeof channelSettingsSchema>;
export type ChannelSettingsInput = z.input<typeof channelSettingsSchema>;
export type Waveform = z.infer<typeof waveformSchema>;
export type BodyRegion = (typeof bodyRegions)[number];
