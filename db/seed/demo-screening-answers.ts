import type { ScreeningFormValues } from "@/lib/screening/schema";

// Invented screening answers for the demo clients, dated relative to the day the demo is seeded.
function daysFromToday(days: number): string {
  const date = new Date();
  date.setUTCDate(date.getUTCDate() + days);
  return date.toISOString().slice(0, 10);
}

export function demoScreeningAnswers(options: { diagnosis: string; side: "left" | "right"; site: string; onsetDaysAgo: number; pacemaker?: boolean }): ScreeningFormValues {
  const answers: ScreeningFormValues = {
    context: { diagnosis: options.diagnosis, affectedSide: options.side, onset: { date: daysFromToday(-options.onsetDaysAgo) }, appliedBy: "both", carerPresent: "yes" },
    redFlags: {
      activeImplant: options.pacemaker ? "yes" : "no",
      uncontrolledEpilepsy: "no",
      pregnancy: "no",
      unstableHeartDisease: "no",
      noReliableFeedback: "no",
    },
    sites: [
      {
        name: options.site,
        skinIntact: "yes",
        sensationMethod: "sharp-blunt",
        sensationResult: "intact",
        clotHistory: "no",
        malignancyOrRadiotherapy: "no",
        recentFractureOrSurgery: "no",
        swelling: "no",
        metalwork: "no",
        clearOfNeckAndChest: "yes",
      },
    ],
    capacity: { understanding: "yes", dexterity: "yes", carerCompetence: "competent" },
    testStimulation: { done: "yes", tolerance: "comfortable", movement: "clear", skinAfter: "faint-pink" },
    outcome: { result: "eligible", rescreenOn: daysFromToday(84) },
  };
  if (options.pacemaker) {
    answers.outcome = { ...answers.outcome, result: "eligible-with-precautions", notes: "Pacemaker: awaiting the cardiology team's written clearance." };
  }
  return answers;
}
