import { z } from "zod";
import {
  AFFECTED_SIDES,
  APPLIERS,
  CARER_COMPETENCE,
  MAX_SITES,
  MOVEMENT,
  OUTCOMES,
  SENSATION_METHODS,
  SENSATION_RESULTS,
  SKIN_AFTER,
  TOLERANCE,
  type RedFlagKey,
} from "./questions";
import { consistencyProblems } from "./consistency";
import { choice, optionalDate, optionalText, requiredText, todayIso, yesNo } from "./schema-parts";

// One schema for a screening's answers, shared by the form (zodResolver) and the signing route. Sections A–F follow
// the screening checklist of REFERENCES.md. Fields whose rules depend on one another sit in their own small object
// (onset, test stimulation, outcome) so that their checks run even while other sections still have gaps.
// The reviewer and the date are not answers: they come from the signing therapist and the moment of signing.

const onsetSchema = z
  .object({
    date: optionalDate("Enter the onset date as a real date, or leave it empty and give the time since onset."),
    timeSince: optionalText(60, "Keep the time since onset short, for example “about 8 months”."),
  })
  .superRefine((value, ctx) => {
    if (!value.date && !value.timeSince) {
      ctx.addIssue({ code: "custom", path: ["date"], message: "Enter the onset date, or the time since onset if the date is not known." });
    }
    if (value.date && value.date > todayIso()) {
      ctx.addIssue({ code: "custom", path: ["date"], message: "The onset date cannot be in the future." });
    }
  });

const contextSchema = z.object({
  diagnosis: requiredText("Enter the diagnosis, for example “stroke, left hemisphere”.", 200, "Keep the diagnosis under 200 characters."),
  affectedSide: choice(AFFECTED_SIDES, "Choose the affected side."),
  onset: onsetSchema,
  appliedBy: choice(APPLIERS, "Choose who will apply the electrodes at home."),
  carerPresent: yesNo("Say whether a carer was present at this screening."),
});

const redFlagsSchema = z.object({
  activeImplant: yesNo("Say whether the client has a pacemaker, defibrillator or other active implant."),
  uncontrolledEpilepsy: yesNo("Say whether the client has uncontrolled epilepsy."),
  pregnancy: yesNo("Say whether the client is, or could be, pregnant."),
  unstableHeartDisease: yesNo("Say whether the client has unstable heart disease."),
  noReliableFeedback: yesNo("Say whether the client cannot give reliable feedback and has no capable carer."),
} satisfies Record<RedFlagKey, z.ZodType>);

const siteSchema = z.object({
  name: requiredText("Name the site, for example “right wrist and finger extensors”.", 80, "Keep the site name under 80 characters."),
  skinIntact: yesNo("Say whether the skin at this site is intact."),
  sensationMethod: choice(SENSATION_METHODS, "Choose how you tested sensation at this site."),
  sensationResult: choice(SENSATION_RESULTS, "Choose the result of the sensation test."),
  clotHistory: yesNo("Say whether there is a history of a blood clot in this limb."),
  malignancyOrRadiotherapy: yesNo("Say whether there is a malignancy, or has been radiotherapy, in this region."),
  recentFractureOrSurgery: yesNo("Say whether there has been a recent fracture or surgery here."),
  swelling: yesNo("Say whether this area is swollen."),
  metalwork: yesNo("Say whether there is metalwork (a plate, screws, a joint replacement) under or near this site."),
  clearOfNeckAndChest: yesNo("Say whether this site is well clear of the front of the neck and the chest."),
  notes: optionalText(500, "Keep the notes for this site under 500 characters."),
});

const sitesSchema = z
  .array(siteSchema, { error: "Add at least one electrode site." })
  .min(1, "Add at least one electrode site.")
  .max(MAX_SITES, `Record at most ${MAX_SITES} electrode sites in one screening.`)
  .superRefine((sites, ctx) => {
    // Concerns and clearances name the site, so each name has to pick out one site.
    const seen = new Set<string>();
    sites.forEach((site, index) => {
      const key = site.name.toLowerCase();
      if (seen.has(key)) ctx.addIssue({ code: "custom", path: [index, "name"], message: "Another site already has this name: name each site differently." });
      seen.add(key);
    });
  });

const capacitySchema = z.object({
  understanding: yesNo("Say whether the client understands how to use the stimulator safely and when to stop."),
  dexterity: yesNo("Say whether the client has the dexterity to apply and remove the electrodes."),
  carerCompetence: choice(CARER_COMPETENCE, "Choose what best describes the carer."),
});

const testStimulationSchema = z
  .object({
    done: yesNo("Say whether a test stimulation was done in clinic."),
    tolerance: choice(TOLERANCE, "Choose how well the test stimulation was tolerated.").nullish(),
    movement: choice(MOVEMENT, "Choose what movement the test stimulation produced.").nullish(),
    skinAfter: choice(SKIN_AFTER, "Choose how the skin looked 10–20 minutes afterwards.").nullish(),
    notDoneReason: optionalText(300, "Keep the reason under 300 characters."),
  })
  .superRefine((value, ctx) => {
    const missing = (path: string, message: string) => ctx.addIssue({ code: "custom", path: [path], message });
    if (value.done === "yes") {
      if (!value.tolerance) missing("tolerance", "Choose how well the test stimulation was tolerated.");
      if (!value.movement) missing("movement", "Choose what movement the test stimulation produced.");
      if (!value.skinAfter) missing("skinAfter", "Choose how the skin looked 10–20 minutes afterwards.");
    } else if (!value.notDoneReason) {
      missing("notDoneReason", "Say why no test stimulation was done.");
    }
  })
  // Answers to the branch not taken (a tolerance chosen before switching to "no") are not kept in the signed record.
  .transform((value) =>
    value.done === "yes"
      ? { done: "yes" as const, tolerance: value.tolerance!, movement: value.movement!, skinAfter: value.skinAfter! }
      : { done: "no" as const, notDoneReason: value.notDoneReason! },
  );

const outcomeSchema = z
  .object({
    result: choice(OUTCOMES, "Choose the outcome of this screening."),
    rescreenOn: optionalDate("Enter the re-screen date as a real date."),
    notes: optionalText(1000, "Keep the notes under 1,000 characters."),
  })
  .superRefine((value, ctx) => {
    const add = (path: string, message: string) => ctx.addIssue({ code: "custom", path: [path], message });
    if (!value.rescreenOn && value.result !== "not-eligible") add("rescreenOn", "Choose the date by which to screen again.");
    if (value.rescreenOn && value.rescreenOn <= todayIso()) add("rescreenOn", "Choose a re-screen date after today.");
    // common practice (no published source): a qualified outcome says what the qualification is.
    if (value.result === "eligible-with-precautions" && !value.notes) add("notes", "List the precautions the client and carer should follow.");
    if (value.result === "not-eligible" && !value.notes) add("notes", "Say why the client is not eligible for now.");
  });

export const screeningAnswersSchema = z.object({
  context: contextSchema,
  redFlags: redFlagsSchema,
  sites: sitesSchema,
  capacity: capacitySchema,
  testStimulation: testStimulationSchema,
  outcome: outcomeSchema,
});

// What a therapist signs: the answers, plus the checks that the outcome agrees with them (lib/screening/rules.ts).
export const signScreeningSchema = screeningAnswersSchema.superRefine((answers, ctx) => {
  for (const problem of consistencyProblems(answers)) {
    ctx.addIssue({ code: "custom", path: problem.path, message: problem.message });
  }
});

export type ScreeningAnswers = z.output<typeof screeningAnswersSchema>;
export type ScreeningFormValues = z.input<typeof signScreeningSchema>;
export type SiteAnswers = ScreeningAnswers["sites"][number];
