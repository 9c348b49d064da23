import { describe, expect, it } from "vitest";
import type { ChannelSettings } from "@/lib/stim";
import { demoChannel, findingCodes, findingOf, round } from "./helpers";

const thumb = round(1.25, "in");

describe("overflow-risk-hand-wrist (warning)", () => {
  const hand: Partial<ChannelSettings> = { bodyRegion: "hand-wrist", phaseDurationUs: 400, electrodes: [thumb, thumb] };

  it("warns for long phases on a small electrode at the hand and wrist", () => {
    // common practice (no published source): long pulses risk overflow, above all around the hand and wrist
    expect(findingOf(demoChannel(hand), "overflow-risk-hand-wrist")?.severity).toBe("warning");
  });

  it("is silent for usual phases, another region, or the common 2 in electrode", () => {
    // common practice (no published source): about 250–300 µs is usual
    expect(findingCodes(demoChannel({ ...hand, phaseDurationUs: 300 }))).not.toContain("overflow-risk-hand-wrist");
    // common practice (no published source): the overflow rule is about the hand and wrist
    expect(findingCodes(demoChannel({ ...hand, bodyRegion: "upper-arm" }))).not.toContain("overflow-risk-hand-wrist");
    // common practice (no published source): 2 in round is the common arm electrode, not a small one
    expect(findingCodes(demoChannel({ ...hand, electrodes: [round(2, "in"), round(2, "in")] }))).not.toContain(
      "overflow-risk-hand-wrist",
    );
  });
});

describe("electrodes-too-close (warning)", () => {
  it("warns when the recorded spacing is under about 3 cm", () => {
    // common practice (no published source): about 3 cm (three finger-widths) apart at least
    expect(findingOf(demoChannel({ interElectrodeSpacingCm: 2 }), "electrodes-too-close")?.severity).toBe("warning");
  });

  it("is silent at 3 cm or more, or when no spacing was recorded", () => {
    // common practice (no published source): about 3 cm (three finger-widths) apart at least
    expect(findingCodes(demoChannel({ interElectrodeSpacingCm: 3 }))).not.toContain("electrodes-too-close");
    expect(findingCodes(demoChannel())).not.toContain("electrodes-too-close");
  });
});

describe("electrode-sizes-differ (note)", () => {
  it("notes a pair of different sizes", () => {
    // common practice (no published source): the smaller electrode carries the higher density
    expect(findingOf(demoChannel({ electrodes: [round(2, "in"), thumb] }), "electrode-sizes-differ")?.severity).toBe("note");
  });

  it("is silent for equal sizes, even when typed in different units", () => {
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic); 1 in = 2.54 cm exactly
    expect(findingCodes(demoChannel({ electrodes: [round(2, "in"), round(5.08)] }))).not.toContain("electrode-sizes-differ");
  });
});

describe("short-rest-early (note)", () => {
  it("notes an on:rest shorter than 1:5 early in a programme", () => {
    const f = findingOf(demoChannel({ earlyProgramme: true }), "short-rest-early");
    // common practice (no published source): on:rest about 1:5 early on
    expect(f?.severity).toBe("note");
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): 10 s rest / 7 s on, / 5 s hold
    expect(f?.numbers?.restPerOnWithRamps).toBeCloseTo(10 / 7, 9);
    expect(f?.numbers?.restPerOnHoldOnly).toBeCloseTo(2, 9);
  });

  it("notes continuous stimulation (no rest) early on", () => {
    // common practice (no published source): on:rest about 1:5 early on
    expect(findingCodes(demoChannel({ earlyProgramme: true, restS: 0 }))).toContain("short-rest-early");
  });

  it("is silent at 1:5 early on, and later in a programme", () => {
    // common practice (no published source): on:rest about 1:5 early on; 7 s on (with ramps), 35 s rest
    expect(findingCodes(demoChannel({ earlyProgramme: true, restS: 35 }))).not.toContain("short-rest-early");
    // common practice (no published source): the rest shortens as endurance builds
    expect(findingCodes(demoChannel({ earlyProgramme: false }))).not.toContain("short-rest-early");
    expect(findingCodes(demoChannel())).not.toContain("short-rest-early");
  });
});
