import type { ScreeningFormValues } from "@/lib/screening/schema";
import { todayIso } from "@/lib/screening/schema-parts";

// Invented test answers: a complete screening with no red flags and no concerns, which tests then change one answer
// at a time. Also used by the integration tests in tests/integration/screening.

export function isoDaysFromToday(days: number): string {
  const date = new Date(`${todayIso()}T12:00:00Z`);
  date.setUTCDate(date.getUTCDate() + days);
  return date.toISOString().slice(0, 10);
}

export type SiteValues = ScreeningFormValues["sites"][number];

export function cleanSite(name = "Right wrist and finger extensors"): SiteValues {
  return {
    name,
    skinIntact: "yes",
    sensationMethod: "sharp-blunt",
    sensationResult: "intact",
    clotHistory: "no",
    malignancyOrRadiotherapy: "no",
    recentFractureOrSurgery: "no",
    swelling: "no",
    metalwork: "no",
    clearOfNeckAndChest: "yes",
  };
}

export function cleanAnswers(): ScreeningFormValues {
  return {
    context: {
      diagnosis: "Stroke, left hemisphere",
      affectedSide: "right",
      onset: { date: isoDaysFromToday(-240) },
      appliedBy: "client",
      carerPresent: "no",
    },
    redFlags: {
      activeImplant: "no",
      uncontrolledEpilepsy: "no",
      pregnancy: "no",
      unstableHeartDisease: "no",
      noReliableFeedback: "no",
    },
    sites: [cleanSite()],
    capacity: { understanding: "yes", dexterity: "yes", carerCompetence: "no-carer" },
    testStimulation: { done: "yes", tolerance: "comfortable", movement: "clear", skinAfter: "faint-pink" },
    outcome: { result: "eligible", rescreenOn: isoDaysFromToday(90) },
  };
}

// The same answers with a precaution outcome, which any concern or red flag allows.
export function withPrecautions(answers: ScreeningFormValues, notes = "Check the skin after every session."): ScreeningFormValues {
  return { ...answers, outcome: { ...answers.outcome, result: "eligible-with-precautions", notes } };
}
