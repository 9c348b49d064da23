import { describe, expect, it } from "vitest";
import { RED_FLAGS } from "@/lib/screening/questions";
import { allConcerns, consistencyProblems, generalConcerns, redFlagsPresent, siteConcerns, type ConcernCode } from "@/lib/screening/rules";
import type { ScreeningFormValues } from "@/lib/screening/schema";
import { cleanAnswers, cleanSite, type SiteValues } from "./answers-fixture";

// Each rule is checked both ways: the answer that triggers it, and the clean answers that do not. The checklist's
// structure is synthesised from Houghton et al. (2010) and Nussbaum et al. (2017), from memory where not cited.

const codes = (answers: ScreeningFormValues) => allConcerns(answers).map((c) => c.code);
const withSite = (change: Partial<SiteValues>): ScreeningFormValues => ({ ...cleanAnswers(), sites: [{ ...cleanSite(), ...change }] });

describe("systemic red flags", () => {
  it("finds none in a clean screening, and no concerns either", () => {
    expect(redFlagsPresent(cleanAnswers())).toEqual([]);
    expect(allConcerns(cleanAnswers())).toEqual([]);
  });

  // source: screening checklist in REFERENCES.md, section B (synthesised; from memory where not cited)
  it.each(RED_FLAGS.map((flag) => [flag.id, flag.key] as const))("reports %s under its stable id when answered yes", (id, key) => {
    const answers = cleanAnswers();
    expect(redFlagsPresent({ ...answers, redFlags: { ...answers.redFlags, [key]: "yes" } })).toEqual([id]);
  });

  it("keeps the stored ids stable (they are written into signed screenings and clearances)", () => {
    expect(RED_FLAGS.map((flag) => flag.id)).toEqual([
      "active-implant",
      "uncontrolled-epilepsy",
      "pregnancy",
      "unstable-heart-disease",
      "no-reliable-feedback",
    ]);
  });

  it("ignores an unanswered question in a half-filled form", () => {
    expect(redFlagsPresent({ redFlags: { activeImplant: null, pregnancy: "yes" } })).toEqual(["pregnancy"]);
    expect(redFlagsPresent({})).toEqual([]);
  });
});

describe("concerns at an electrode site", () => {
  const cases: [string, Partial<SiteValues>, ConcernCode, "do-not-place" | "precaution" | "note"][] = [
    // common practice (no published source); Houghton et al. 2010 as recalled (from memory, unverified)
    ["skin not intact", { skinIntact: "no" }, "skin-not-intact", "do-not-place"],
    // source: IEC 60601-2-10:2012, warning against the front of the neck (carotid sinus) and transthoracic paths
    ["too near the neck or chest", { clearOfNeckAndChest: "no" }, "too-close-to-neck-or-chest", "do-not-place"],
    // from memory, unverified: Houghton et al. 2010, stimulation over a (possible) thrombus
    ["clot history in the limb", { clotHistory: "yes" }, "clot-history", "do-not-place"],
    // from memory, unverified: Houghton et al. 2010, stimulation over malignancy or irradiated tissue
    ["malignancy or radiotherapy", { malignancyOrRadiotherapy: "yes" }, "malignancy-or-radiotherapy", "do-not-place"],
    // from memory, unverified: Houghton et al. 2010, impaired sensation as a precaution
    ["sensation absent", { sensationResult: "absent" }, "sensation-absent", "precaution"],
    ["sensation reduced", { sensationResult: "reduced" }, "sensation-reduced", "precaution"],
    // from memory, unverified: Houghton et al. 2010, recent fracture or surgery as a precaution
    ["recent fracture or surgery", { recentFractureOrSurgery: "yes" }, "recent-fracture-or-surgery", "precaution"],
    // common practice (no published source)
    ["swelling", { swelling: "yes" }, "swelling", "precaution"],
    // source: REFERENCES checklist, section C: metalwork is recorded as a flag only
    ["metalwork", { metalwork: "yes" }, "metalwork", "note"],
  ];

  it.each(cases)("raises a concern for %s, at the right level and naming the site", (_name, change, code, level) => {
    const concerns = siteConcerns(withSite(change));
    expect(concerns.map((c) => [c.code, c.level])).toEqual([[code, level]]);
    expect(concerns[0]!.site).toEqual({ index: 0, name: "Right wrist and finger extensors" });
    expect(concerns[0]!.source.length).toBeGreaterThan(10);
  });

  it("keeps each site's concerns to that site", () => {
    const answers = { ...cleanAnswers(), sites: [cleanSite("Left forearm"), { ...cleanSite("Left shoulder"), skinIntact: "no" as const }] };
    expect(siteConcerns(answers).map((c) => c.site)).toEqual([{ index: 1, name: "Left shoulder" }]);
  });

  it("lists the strongest concerns first", () => {
    expect(codes(withSite({ metalwork: "yes", swelling: "yes", skinIntact: "no" }))).toEqual(["skin-not-intact", "swelling", "metalwork"]);
  });
});

describe("concerns about capacity and the test stimulation", () => {
  const base = cleanAnswers();
  // common practice (no published source) for all of these
  it("raises limited understanding, and limited dexterity only when the client applies the electrodes alone", () => {
    expect(codes({ ...base, capacity: { ...base.capacity, understanding: "no" } })).toEqual(["understanding-limited"]);
    expect(codes({ ...base, capacity: { ...base.capacity, dexterity: "no" } })).toEqual(["dexterity-limited"]);
    const carerApplies = { ...base, context: { ...base.context, appliedBy: "carer" as const } };
    expect(codes({ ...carerApplies, capacity: { understanding: "yes", dexterity: "no", carerCompetence: "competent" } })).toEqual([]);
  });

  it("raises a carer who applies the electrodes but cannot yet do it safely", () => {
    const answers = { ...base, context: { ...base.context, appliedBy: "both" as const }, capacity: { ...base.capacity, carerCompetence: "not-yet" as const } };
    expect(codes(answers)).toEqual(["carer-not-yet-competent"]);
  });

  it("raises a missing, untolerated or skin-marking test stimulation, and notes one with no contraction", () => {
    const test = (value: ScreeningFormValues["testStimulation"]) => generalConcerns({ ...base, testStimulation: value }).map((c) => [c.code, c.level]);
    expect(test({ done: "no", notDoneReason: "Device not available" })).toEqual([["test-not-done", "precaution"]]);
    expect(test({ done: "yes", tolerance: "not-tolerated", movement: "clear", skinAfter: "no-change" })).toEqual([["test-not-tolerated", "precaution"]]);
    // from memory, unverified: REFERENCES rule of thumb — faint pinkness within the outline is usually normal,
    // redness beyond it, blisters or broken skin need the therapist
    expect(test({ done: "yes", tolerance: "comfortable", movement: "clear", skinAfter: "faint-pink" })).toEqual([]);
    expect(test({ done: "yes", tolerance: "comfortable", movement: "clear", skinAfter: "redness-beyond" })).toEqual([["test-skin-reaction", "precaution"]]);
    expect(test({ done: "yes", tolerance: "comfortable", movement: "clear", skinAfter: "damage" })).toEqual([["test-skin-reaction", "precaution"]]);
    expect(test({ done: "yes", tolerance: "comfortable", movement: "none", skinAfter: "no-change" })).toEqual([["test-no-contraction", "note"]]);
  });
});

describe("consistency of the outcome with the answers", () => {
  // common practice (no published source): these keep the signed record coherent; the therapist still decides.
  const outcomeProblem = (answers: ScreeningFormValues) => consistencyProblems(answers).find((p) => p.path.join(".") === "outcome.result");

  it("accepts a clean screening signed as eligible", () => {
    expect(consistencyProblems(cleanAnswers())).toEqual([]);
  });

  it("refuses 'eligible' while a site has a concern, asking for precautions or not eligible", () => {
    const problem = outcomeProblem(withSite({ sensationResult: "absent" }));
    expect(problem?.code).toBe("eligible-with-concerns");
    expect(problem?.message).toBe(
      "This screening records Right wrist and finger extensors: sensation absent. Choose “Eligible with precautions” or “Not eligible”.",
    );
  });

  it("refuses 'eligible' with a red flag, but allows it with precautions (the flag then waits for clearance)", () => {
    const base = cleanAnswers();
    const flagged = { ...base, redFlags: { ...base.redFlags, activeImplant: "yes" as const } };
    expect(outcomeProblem(flagged)?.message).toMatch(/^This screening records Pacemaker, defibrillator or other active implant\./);
    expect(consistencyProblems({ ...flagged, outcome: { ...flagged.outcome, result: "eligible-with-precautions", notes: "Await cardiology" } })).toEqual([]);
  });

  it("does not count a note (metalwork) against 'eligible'", () => {
    expect(consistencyProblems(withSite({ metalwork: "yes" }))).toEqual([]);
  });

  it("shortens a long list of reasons", () => {
    const busySite = { ...cleanSite("Left forearm"), swelling: "yes" as const, sensationResult: "reduced" as const, recentFractureOrSurgery: "yes" as const };
    const base = { ...cleanAnswers(), sites: [busySite] };
    const answers = { ...base, capacity: { ...base.capacity, understanding: "no" as const } };
    expect(outcomeProblem(answers)?.message).toBe(
      "This screening records Left forearm: sensation reduced; Left forearm: recent fracture or surgery; Left forearm: swelling; and 1 more. Choose “Eligible with precautions” or “Not eligible”.",
    );
  });

  it("refuses any outcome but 'not eligible' when every site is one not to place electrodes on", () => {
    const answers = withSite({ skinIntact: "no" });
    for (const result of ["eligible", "eligible-with-precautions"] as const) {
      const problem = outcomeProblem({ ...answers, outcome: { ...answers.outcome, result, notes: "x x" } });
      expect(problem?.code).toBe("no-usable-site");
      expect(problem?.message).toMatch(/Choose “Not eligible”, or add the site you will use\./);
    }
    expect(outcomeProblem({ ...answers, outcome: { result: "not-eligible", notes: "Wound" } })).toBeUndefined();
    expect(outcomeProblem({ ...answers, sites: [...answers.sites, cleanSite("Left forearm")], outcome: { ...answers.outcome, result: "eligible-with-precautions", notes: "Use the forearm only" } })).toBeUndefined();
  });

  it("refuses a carer who applies the electrodes when section D says there is no carer", () => {
    const base = cleanAnswers();
    const problems = consistencyProblems({ ...base, context: { ...base.context, appliedBy: "carer" } });
    expect(problems.map((p) => [p.path.join("."), p.code])).toEqual([["capacity.carerCompetence", "carer-applies-but-none"]]);
  });

  it("refuses 'no capable carer' alongside a carer recorded as competent", () => {
    const base = cleanAnswers();
    const problems = consistencyProblems({
      ...base,
      redFlags: { ...base.redFlags, noReliableFeedback: "yes" },
      capacity: { ...base.capacity, carerCompetence: "competent" },
      outcome: { ...base.outcome, result: "eligible-with-precautions", notes: "x x" },
    });
    expect(problems.map((p) => p.path.join("."))).toEqual(["redFlags.noReliableFeedback"]);
  });
});
