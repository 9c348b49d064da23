import { z } from "zod";
import { RED_FLAG_IDS } from "./questions";
import { requiredText } from "./schema-parts";

// A named clinician's clearance of one systemic red flag; shared by the clearance form and its route.
export const recordClearanceSchema = z.object({
  flag: z.enum(RED_FLAG_IDS, { error: "Choose the red flag this clearance is for." }),
  clinicianName: requiredText(
    "Enter the name and role of the clinician who gave the clearance, for example “Dr A. Okafor, cardiologist”.",
    120,
    "Keep the clinician's name and role under 120 characters.",
  ),
  note: requiredText(
    "Say what the clearance covers and how it was given, for example “letter of 3 March: forearm stimulation is compatible with the pacemaker”.",
    1000,
    "Keep the note under 1,000 characters.",
  ),
});
export type RecordClearanceInput = z.input<typeof recordClearanceSchema>;
