import { z } from "zod";
import { channelSettingsSchema } from "@/lib/stim";
import { ELECTRODE_TYPE_IDS } from "./labels";

// The published programme, strictly typed. A version's content never changes once written, so everything the
// client was shown (standard cautions included) is stored in it.


export const markerSchema = z.object({
  view: z.enum(["front", "back"]),
  x: z.number().finite(),
  y: z.number().finite(),
});
export type MarkerValue = z.infer<typeof markerSchema>;

// The schedule belongs to the programme, not the channel, so those fields are left out of each channel's settings.
export const channelStimSettingsSchema = channelSettingsSchema.omit({
  sessionMinutes: true,
  sessionsPerDay: true,
  daysPerWeek: true,
  bodyRegion: true,
  earlyProgramme: true,
});

const text = (what: string, max: number) =>
  z.string({ error: `Enter ${what}.` }).trim().min(1, `Enter ${what}.`).max(max, `Keep it under ${max} characters.`);

export const programmeChannelSchema = z.object({
  id: z.string().min(1).max(40),
  target: z.string({ error: "Name the target muscle or movement." }).trim().min(2, "Name the target muscle or movement.").max(120, "Keep it under 120 characters."),
  side: z.enum(["left", "right"], { error: "Choose the side: left or right." }),
  electrodeType: z.enum(ELECTRODE_TYPE_IDS, { error: "Choose the electrode type." }),
  markers: z.tuple([markerSchema, markerSchema], { error: "Place both electrodes on the body outline." }),
  placementNote: z.string().trim().max(300, "Keep the placement note under 300 characters.").optional(),
  photoIds: z.array(z.string().min(1)).max(4, "Add at most 4 placement photos per channel."),
  settings: channelStimSettingsSchema,
});
export type ProgrammeChannel = z.infer<typeof programmeChannelSchema>;

const wholeNumber = (label: string, min: number, max: number) =>
  z
    .number({ error: `Enter the ${label}.` })
    .int(`The ${label} must be a whole number from ${min} to ${max}.`)
    .min(min, `The ${label} must be a whole number from ${min} to ${max}.`)
    .max(max, `The ${label} must be a whole number from ${min} to ${max}.`);

export const scheduleSchema = z.object({
  minutesPerSession: wholeNumber("minutes per session", 1, 240),
  sessionsPerDay: wholeNumber("sessions per day", 1, 6),
  daysPerWeek: wholeNumber("days per week", 1, 7),
  weeks: wholeNumber("number of weeks", 1, 52),
  reviewOn: z.string({ error: "Choose a review date." }).regex(/^\d{4}-\d{2}-\d{2}$/, "Choose a review date."),
  // When the client is prompted to open a new pack of electrodes; absent in versions published before it existed.
  replaceElectrodesAfterUses: wholeNumber("number of uses before new electrodes", 1, 100).optional(),
});
export type Schedule = z.infer<typeof scheduleSchema>;

export const programmeContentSchema = z.object({
  channels: z.array(programmeChannelSchema).min(1, "Add at least one channel.").max(4, "A programme has at most 4 channels."),
  schedule: scheduleSchema,
  skinPreparation: z.array(text("a step", 300)).min(1, "List at least one skin-preparation step.").max(20),
  electrodeCare: z.array(text("a step", 300)).min(1, "List at least one electrode-care step.").max(20),
  standardCautions: z.array(z.string()).min(1),
  ownCautions: z.array(text("a caution", 300)).max(20),
});
export type ProgrammeContent = z.infer<typeof programmeContentSchema>;
