import { z } from "zod";
import { markerSchema } from "./content";

// The shape of a saved draft: text as typed, checked only for shape and size so a half-finished programme can be
// saved, and so whatever is saved can always be loaded back into the builder.
const textValue = z.string().max(2000, "That value is too long.");
const electrode = z.object({
  shape: z.enum(["round", "square", "rectangle"]),
  diameter: textValue,
  side: textValue,
  width: textValue,
  length: textValue,
  unit: z.enum(["cm", "in"]),
});
const settings = z.object({
  frequencyHz: textValue,
  phaseDurationUs: textValue,
  waveform: z.object({
    kind: z.enum(["symmetric-biphasic", "asymmetric-balanced-biphasic", "monophasic"]),
    interphaseGapUs: textValue,
    secondPhaseAmplitudeMa: textValue,
    secondPhaseDurationUs: textValue,
  }),
  rampUpS: textValue,
  holdS: textValue,
  rampDownS: textValue,
  restS: textValue,
  amplitudeCeilingMa: textValue,
  electrodes: z.tuple([electrode, electrode]),
  interElectrodeSpacingCm: textValue,
});
const step = z.object({ text: textValue });

export const programmeDraftSchema = z.object({
  channels: z
    .array(
      z.object({
        id: z.string().min(1).max(40),
        target: textValue,
        side: z.enum(["left", "right", ""]),
        electrodeType: z.enum(["standard-gel", "sensitive-skin-gel", "reusable-carbon", ""]),
        markers: z.tuple([markerSchema.nullable(), markerSchema.nullable()]),
        placementNote: textValue,
        photoIds: z.array(z.string().max(100)).max(4, "Add at most 4 placement photos per channel."),
        settings,
      }),
    )
    .min(1, "Keep at least one channel.")
    .max(4, "A programme has at most 4 channels."),
  schedule: z.object({ minutesPerSession: textValue, sessionsPerDay: textValue, daysPerWeek: textValue, weeks: textValue, reviewOn: textValue, replaceElectrodesAfterUses: textValue.optional() }),
  skinPreparation: z.array(step).max(20),
  electrodeCare: z.array(step).max(20),
  ownCautions: z.array(step).max(20),
});

export const saveDraftSchema = z.object({
  values: programmeDraftSchema,
  baseRevision: z.number({ error: "The draft's revision is missing." }).int().min(0),
});

export const publishSchema = z.object({
  reason: z.string({ error: "Say why you are publishing this version." }).trim().min(3, "Say why you are publishing this version.").max(500, "Keep the reason under 500 characters."),
  baseRevision: z.number({ error: "The draft's revision is missing." }).int().min(0),
  promptedBy: z.object({ type: z.enum(["check-in", "flag", "message"]), id: z.string().min(1).max(100) }).optional(),
});
