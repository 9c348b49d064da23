import { describe, expect, it } from "vitest";
import type { RedFlagClearance, Screening } from "@/db/schema";
import { GATE_NO_SCREENING, gateReasons, summariseScreening } from "@/lib/screening/summary";
import { signScreeningSchema } from "@/lib/screening/schema";
import { cleanAnswers, withPrecautions } from "./answers-fixture";

// source: PRODUCT.md capability 2 — systemic red flags block publishing until a clearance is recorded.
function row(overrides: Partial<Screening> = {}): { screening: Screening; signedByName: string } {
  return {
    signedByName: "Test Therapist",
    screening: {
      id: "screening-1",
      clientId: "client-1",
      version: 3,
      answers: signScreeningSchema.parse(cleanAnswers()),
      redFlags: [],
      outcome: "eligible",
      rescreenOn: "2099-01-01",
      signedById: "user-1",
      signedAt: new Date("2025-03-03T10:00:00Z"),
      ...overrides,
    },
  };
}

function clearance(flag: string, screeningId = "screening-1"): { clearance: RedFlagClearance; recordedByName: string } {
  return {
    recordedByName: "Test Therapist",
    clearance: { id: `c-${flag}`, screeningId, flag, clinicianName: "Dr Test", note: "Cleared.", recordedById: "user-1", recordedAt: new Date() },
  };
}

describe("the summary of a signed screening", () => {
  it("labels the outcome and the red flags, and works the concerns out from the answers", () => {
    const answers = signScreeningSchema.parse(withPrecautions({ ...cleanAnswers(), sites: [{ ...cleanAnswers().sites[0]!, swelling: "yes" }] }));
    const summary = summariseScreening(row({ answers, outcome: "eligible-with-precautions", redFlags: ["pregnancy"] }), []);
    expect(summary).toMatchObject({ version: 3, outcomeLabel: "Eligible with precautions", signedByName: "Test Therapist" });
    expect(summary.redFlags).toEqual([{ id: "pregnancy", label: "Pregnancy", clearance: null }]);
    expect(summary.concerns.map((c) => c.code)).toEqual(["swelling"]);
  });

  it("attaches only this screening's clearances", () => {
    const summary = summariseScreening(row({ redFlags: ["active-implant", "pregnancy"] }), [clearance("pregnancy"), clearance("active-implant", "other")]);
    expect(summary.redFlags.map((flag) => [flag.id, flag.clearance?.clinicianName ?? null])).toEqual([
      ["active-implant", null],
      ["pregnancy", "Dr Test"],
    ]);
  });

  it("reads a stored record with missing answers without failing", () => {
    expect(summariseScreening(row({ answers: {} }), []).concerns).toEqual([]);
  });
});

describe("the publishing gate's reasons", () => {
  it("asks for a screening when there is none", () => {
    expect(gateReasons(null)).toEqual([GATE_NO_SCREENING]);
    expect(GATE_NO_SCREENING).toBe("Sign a screening before publishing.");
  });

  it("gives one reason per uncleared flag, naming it, and one for a not-eligible outcome", () => {
    const summary = summariseScreening(row({ outcome: "not-eligible", redFlags: ["active-implant", "uncontrolled-epilepsy"] }), [clearance("uncontrolled-epilepsy")]);
    expect(gateReasons(summary)).toEqual([
      "The latest screening (version 3) records the client as not eligible: sign a new screening before publishing.",
      "Pacemaker, defibrillator or other active implant: record a named clinician's clearance before publishing.",
    ]);
  });

  it("has nothing to say about a clean, eligible screening", () => {
    expect(gateReasons(summariseScreening(row(), []))).toEqual([]);
  });
});
