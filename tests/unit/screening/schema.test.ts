import { describe, expect, it } from "vitest";
import { screeningAnswersSchema, signScreeningSchema } from "@/lib/screening/schema";
import { fieldErrorsFrom } from "@/lib/validation";
import { cleanAnswers, cleanSite, isoDaysFromToday } from "./answers-fixture";

// The shared schema must turn every kind of bad input into a message on the field it belongs to, in words.
function fieldsOf(input: unknown) {
  const parsed = signScreeningSchema.safeParse(input);
  expect(parsed.success).toBe(false);
  return parsed.success ? {} : fieldErrorsFrom(parsed.error);
}

describe("the screening schema", () => {
  it("accepts a complete screening and keeps its answers", () => {
    const parsed = signScreeningSchema.parse(cleanAnswers());
    expect(parsed.sites).toHaveLength(1);
    expect(parsed.outcome.result).toBe("eligible");
  });

  it("names every unanswered question of an empty form", () => {
    const fields = fieldsOf({ context: { onset: {} }, redFlags: {}, sites: [{}], capacity: {}, testStimulation: {}, outcome: {} });
    expect(fields).toMatchObject({
      "context.diagnosis": expect.stringMatching(/Enter the diagnosis/),
      "context.affectedSide": "Choose the affected side.",
      "context.onset.date": "Enter the onset date, or the time since onset if the date is not known.",
      "context.appliedBy": "Choose who will apply the electrodes at home.",
      "context.carerPresent": "Say whether a carer was present at this screening.",
      "redFlags.activeImplant": "Say whether the client has a pacemaker, defibrillator or other active implant.",
      "redFlags.uncontrolledEpilepsy": "Say whether the client has uncontrolled epilepsy.",
      "redFlags.pregnancy": "Say whether the client is, or could be, pregnant.",
      "redFlags.unstableHeartDisease": "Say whether the client has unstable heart disease.",
      "redFlags.noReliableFeedback": "Say whether the client cannot give reliable feedback and has no capable carer.",
      "sites.0.name": expect.stringMatching(/Name the site/),
      "sites.0.skinIntact": "Say whether the skin at this site is intact.",
      "sites.0.sensationMethod": "Choose how you tested sensation at this site.",
      "sites.0.sensationResult": "Choose the result of the sensation test.",
      "sites.0.clotHistory": "Say whether there is a history of a blood clot in this limb.",
      "sites.0.malignancyOrRadiotherapy": "Say whether there is a malignancy, or has been radiotherapy, in this region.",
      "sites.0.recentFractureOrSurgery": "Say whether there has been a recent fracture or surgery here.",
      "sites.0.swelling": "Say whether this area is swollen.",
      "sites.0.metalwork": expect.stringMatching(/metalwork/),
      "sites.0.clearOfNeckAndChest": "Say whether this site is well clear of the front of the neck and the chest.",
      "capacity.understanding": expect.stringMatching(/understands/),
      "capacity.dexterity": expect.stringMatching(/dexterity/),
      "capacity.carerCompetence": "Choose what best describes the carer.",
      "testStimulation.done": "Say whether a test stimulation was done in clinic.",
      "outcome.result": "Choose the outcome of this screening.",
    });
  });

  it("refuses a body that is not a screening at all, section by section", () => {
    const fields = fieldsOf("not a screening");
    expect(fields._root).toBeTruthy();
    expect(Object.keys(fieldsOf({})).sort()).toEqual(["capacity", "context", "outcome", "redFlags", "sites", "testStimulation"]);
  });

  it("treats null (an unticked radio group) and unknown options as unanswered", () => {
    const answers = cleanAnswers();
    const fields = fieldsOf({ ...answers, redFlags: { ...answers.redFlags, pregnancy: null }, context: { ...answers.context, affectedSide: "middle" } });
    expect(fields["redFlags.pregnancy"]).toBe("Say whether the client is, or could be, pregnant.");
    expect(fields["context.affectedSide"]).toBe("Choose the affected side.");
  });

  it("takes either an onset date or the time since onset, but not a future or impossible date", () => {
    const answers = cleanAnswers();
    expect(signScreeningSchema.safeParse({ ...answers, context: { ...answers.context, onset: { timeSince: "about 8 months" } } }).success).toBe(true);
    const at = (date: string) => fieldsOf({ ...answers, context: { ...answers.context, onset: { date } } })["context.onset.date"];
    expect(at(isoDaysFromToday(3))).toBe("The onset date cannot be in the future.");
    expect(at("2024-02-30")).toMatch(/real date/);
    // An empty date box is "no date", which needs the time since onset instead.
    expect(at("")).toBe("Enter the onset date, or the time since onset if the date is not known.");
  });

  it("needs between 1 and 8 electrode sites, each with its own name", () => {
    const answers = cleanAnswers();
    expect(fieldsOf({ ...answers, sites: [] }).sites).toBe("Add at least one electrode site.");
    expect(fieldsOf({ ...answers, sites: Array.from({ length: 9 }, (_, i) => cleanSite(`Site ${i}`)) }).sites).toBe(
      "Record at most 8 electrode sites in one screening.",
    );
    expect(fieldsOf({ ...answers, sites: [cleanSite("Forearm"), cleanSite("forearm")] })["sites.1.name"]).toMatch(/Another site already has this name/);
    expect(fieldsOf({ ...answers, sites: [cleanSite("x".repeat(81))] })["sites.0.name"]).toBe("Keep the site name under 80 characters.");
  });

  it("asks for the test's tolerance, movement and skin when it was done, and a reason when it was not", () => {
    const answers = cleanAnswers();
    const done = fieldsOf({ ...answers, testStimulation: { done: "yes" } });
    expect(done).toMatchObject({
      "testStimulation.tolerance": "Choose how well the test stimulation was tolerated.",
      "testStimulation.movement": "Choose what movement the test stimulation produced.",
      "testStimulation.skinAfter": "Choose how the skin looked 10–20 minutes afterwards.",
    });
    expect(fieldsOf({ ...answers, testStimulation: { done: "no" } })["testStimulation.notDoneReason"]).toBe("Say why no test stimulation was done.");
  });

  it("drops the answers of the test branch not taken", () => {
    const answers = cleanAnswers();
    const parsed = screeningAnswersSchema.parse({
      ...answers,
      testStimulation: { done: "no", tolerance: "comfortable", notDoneReason: "Client too tired today" },
    });
    expect(parsed.testStimulation).toEqual({ done: "no", notDoneReason: "Client too tired today" });
  });

  it("needs a re-screen date after today unless the client is not eligible, and notes for a qualified outcome", () => {
    const answers = cleanAnswers();
    const outcome = (value: object) => fieldsOf({ ...answers, outcome: value });
    expect(outcome({ result: "eligible" })["outcome.rescreenOn"]).toBe("Choose the date by which to screen again.");
    expect(outcome({ result: "eligible", rescreenOn: isoDaysFromToday(0) })["outcome.rescreenOn"]).toBe("Choose a re-screen date after today.");
    expect(outcome({ result: "eligible-with-precautions", rescreenOn: isoDaysFromToday(30) })["outcome.notes"]).toBe(
      "List the precautions the client and carer should follow.",
    );
    expect(outcome({ result: "not-eligible" })["outcome.notes"]).toBe("Say why the client is not eligible for now.");
    expect(signScreeningSchema.safeParse({ ...answers, outcome: { result: "not-eligible", notes: "Wound over the forearm" } }).success).toBe(true);
  });

  it("trims text and stores an empty optional box as nothing", () => {
    const answers = cleanAnswers();
    const parsed = signScreeningSchema.parse({
      ...answers,
      context: { ...answers.context, diagnosis: "  Stroke  ", onset: { date: answers.context.onset.date, timeSince: "" } },
      sites: [{ ...cleanSite(), notes: "   " }],
    });
    expect(parsed.context.diagnosis).toBe("Stroke");
    expect(parsed.context.onset.timeSince).toBeUndefined();
    expect(parsed.sites[0]!.notes).toBeUndefined();
  });
});

describe("the shared schema carries the consistency checks", () => {
  // common practice (no published source): the form and the route refuse the same contradictory outcome.
  it("puts the message on the outcome when 'eligible' meets a concern", () => {
    const answers = cleanAnswers();
    const fields = fieldsOf({ ...answers, sites: [{ ...cleanSite(), skinIntact: "no" }, cleanSite("Left forearm")] });
    expect(fields["outcome.result"]).toBe(
      "This screening records Right wrist and finger extensors: skin not intact. Choose “Eligible with precautions” or “Not eligible”.",
    );
  });

  it("keeps them out of the structural schema", () => {
    const answers = cleanAnswers();
    expect(screeningAnswersSchema.safeParse({ ...answers, sites: [{ ...cleanSite(), skinIntact: "no" }] }).success).toBe(true);
  });
});
