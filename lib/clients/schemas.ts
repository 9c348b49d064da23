import { z } from "zod";

const optionalText = (label: string, max: number) =>
  z
    .string({ error: `The ${label} must be text.` })
    .trim()
    .max(max, `Keep the ${label} under ${max} characters.`)
    .transform((value) => (value === "" ? null : value))
    .nullable()
    .optional();

// ISO date (yyyy-mm-dd) not in the future: the day the condition began, if known.
const pastDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "Enter the date as day, month and year.")
  .refine((value) => !Number.isNaN(Date.parse(value)), "Enter a real date.")
  .refine((value) => Date.parse(value) <= Date.now(), "The date of onset cannot be in the future.");

export const clientDetailsSchema = z.object({
  condition: optionalText("condition", 200),
  affectedSide: z.enum(["left", "right", "both"], { error: "Choose the affected side: left, right or both." }).nullable().optional(),
  goals: optionalText("goals", 2000),
  onsetDate: z
    .union([pastDate, z.literal("")])
    .transform((value) => (value === "" ? null : value))
    .nullable()
    .optional(),
});
export type ClientDetailsInput = z.input<typeof clientDetailsSchema>;

export const CONSENT_LABELS = {
  treatment: "Treatment with electrical stimulation",
  "remote-monitoring": "Remote monitoring through Rampline",
  "photos-care": "Photos, for their care only",
  "photos-teaching": "Photos, also for teaching (identifying features removed)",
} as const;

export const recordConsentSchema = z.object({
  kind: z.enum(["treatment", "remote-monitoring", "photos-care", "photos-teaching"], { error: "Choose which consent this is." }),
  status: z.enum(["given", "withdrawn"], { error: "Say whether consent was given or withdrawn." }),
  method: z.enum(["verbal", "written", "in-app"], { error: "Say how it was given: in person, in writing or in Rampline." }),
  note: optionalText("note", 500),
});
export type RecordConsentInput = z.input<typeof recordConsentSchema>;
