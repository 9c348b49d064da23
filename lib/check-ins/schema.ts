import { z } from "zod";

// One schema for the check-in form and the route. The server also checks it against the version in force (the
// channels and electrodes must be that version's), which the form cannot know on its own.
// Radio buttons give their value as text; an unanswered group gives null. Both become a number or "not answered".
const choiceNumber = <T extends z.ZodType>(schema: T) =>
  z.preprocess((value) => (value === "" || value === null || value === undefined ? undefined : Number(value)), schema);

const isoDate = z.string({ error: "Choose the day of the session." }).regex(/^\d{4}-\d{2}-\d{2}$/, "Choose the day of the session.");

export const checkInSchema = z.object({
  sessionDate: isoDate,
  minutes: z
    .number({ error: "Enter how many minutes you did." })
    .int("Enter whole minutes.")
    .min(1, "Enter at least 1 minute.")
    .max(240, "A session can be at most 240 minutes."),
  comfort: choiceNumber(z.number({ error: "Choose how comfortable it was, from 0 to 10." }).int().min(0, "Choose from 0 to 10.").max(10, "Choose from 0 to 10.")),
  movement: z.enum(["full", "partial", "none"], { error: "Say what movement you saw." }),
  fatigue: z.enum(["none", "mild", "moderate", "severe"], { error: "Say how tired the muscles felt." }),
  versionNumber: choiceNumber(z.number({ error: "Say which settings your stimulator was set to." }).int().min(1).optional()),
  channels: z
    .array(
      z.object({
        channelId: z.string().min(1).max(40),
        amplitudeMa: z
          .number({ error: "Enter the strength you reached, in mA (0 if you did not use this channel)." })
          .min(0, "The strength cannot be negative.")
          .max(200, "Check the strength: it must be 200 mA or less."),
      }),
    )
    .min(1)
    .max(4),
  skin: z
    .array(
      z.object({
        channelId: z.string().min(1).max(40),
        electrode: z.enum(["A", "B"]),
        level: choiceNumber(z.number({ error: "Choose how the skin looks under this electrode." }).int().min(1, "Choose how the skin looks under this electrode.").max(5, "Choose how the skin looks under this electrode.")),
        spreads: z.boolean(),
        itch: z.boolean(),
        photoIds: z.array(z.string().min(1).max(100)).max(3, "Add at most 3 photos per electrode."),
      }),
    )
    .min(2)
    .max(8),
  electrodeCondition: z.enum(["fine", "edges-lifting", "poor-sticking"], { error: "Say how the electrodes stuck." }),
  notes: z.string().trim().max(1000, "Keep the notes under 1,000 characters.").optional(),
});
export type CheckInInput = z.input<typeof checkInSchema>;
export type CheckInData = z.output<typeof checkInSchema>;
