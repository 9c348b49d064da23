import { describe, expect, it } from "vitest";
import { analyseChannel } from "@/lib/stim";
import { demoChannel, demoChannelWithout, findingCodes, findingOf } from "./helpers";

describe("pulses-overlap (blocks)", () => {
  it("blocks two 600 µs phases at 1,000 Hz, whose period is only 1,000 µs", () => {
    const f = findingOf(demoChannel({ frequencyHz: 1000, phaseDurationUs: 600 }), "pulses-overlap");
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): period = 1/f
    expect(f?.severity).toBe("blocks");
    expect(f?.title).toBe("Pulses overlap");
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): 1/(1,200 µs)
    expect(f?.numbers?.maxFrequencyHz).toBeCloseTo(1e6 / 1200, 6);
  });

  it("blocks pulses that exactly fill the period, leaving no gap", () => {
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): 2 × 500 µs = 1/1,000 Hz
    const f = findingOf(demoChannel({ frequencyHz: 1000, phaseDurationUs: 500 }), "pulses-overlap");
    expect(f?.title).toBe("No gap between pulses");
  });

  it("counts the interphase gap as part of the pulse", () => {
    const waveform = { kind: "symmetric-biphasic", interphaseGapUs: 150 } as const;
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): 450 + 150 + 450 > 1,000 µs
    expect(findingCodes(demoChannel({ frequencyHz: 1000, phaseDurationUs: 450, waveform }))).toContain("pulses-overlap");
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): 450 + 450 < 1,000 µs
    expect(findingCodes(demoChannel({ frequencyHz: 1000, phaseDurationUs: 450 }))).not.toContain("pulses-overlap");
  });

  it("uses the second phase's own duration for an asymmetric pulse", () => {
    const waveform = { kind: "asymmetric-balanced-biphasic", secondPhaseAmplitudeMa: 4, secondPhaseDurationUs: 3000 } as const;
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): 300 + 3,000 µs against 2,857 µs at 350 Hz
    expect(findingCodes(demoChannel({ frequencyHz: 350, waveform }))).toContain("pulses-overlap");
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): 3,300 µs within 28,571 µs at 35 Hz
    expect(findingCodes(demoChannel({ waveform }))).not.toContain("pulses-overlap");
  });

  it("does not fire for ordinary settings", () => {
    expect(findingCodes(demoChannel())).not.toContain("pulses-overlap");
  });
});

describe("value-out-of-range and value-invalid (blocks)", () => {
  it("turns a non-positive value into a blocking finding at its field", () => {
    const r = analyseChannel(demoChannel({ amplitudeCeilingMa: 0 }));
    expect(r.ok).toBe(false);
    expect(r.derived).toBeUndefined();
    expect(r.findings).toContainEqual(
      expect.objectContaining({ code: "value-out-of-range", severity: "blocks", field: "amplitudeCeilingMa" }),
    );
    expect(r.fieldErrors.amplitudeCeilingMa).toMatch(/more than 0 mA/);
  });

  it("turns an out-of-range value into a blocking finding", () => {
    const r = analyseChannel(demoChannel({ frequencyHz: 50_000 }));
    expect(r.findings).toContainEqual(expect.objectContaining({ code: "value-out-of-range", field: "frequencyHz" }));
  });

  it("reports a missing value as not valid", () => {
    expect(analyseChannel(demoChannelWithout("holdS")).findings).toContainEqual(expect.objectContaining({ code: "value-invalid", field: "holdS" }));
  });

  it("still shows a pulse block when another field is bad", () => {
    const codes = findingCodes(demoChannel({ frequencyHz: 1000, phaseDurationUs: 600, sessionMinutes: -1 }));
    expect(codes).toEqual(expect.arrayContaining(["value-out-of-range", "pulses-overlap"]));
  });

  it("gives no input finding for valid settings", () => {
    const codes = findingCodes(demoChannel());
    expect(codes).not.toContain("value-out-of-range");
    expect(codes).not.toContain("value-invalid");
  });
});

describe("on-time-zero and ramps-exceed-on-time (blocks)", () => {
  it("blocks a cycle with no ramps and no hold", () => {
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): no on time, no current
    const r = analyseChannel(demoChannel({ rampUpS: 0, holdS: 0, rampDownS: 0 }));
    expect(r.findings[0]?.code).toBe("on-time-zero");
    expect(r.ok).toBe(false);
  });

  it("blocks ramps that take the whole on time (no hold)", () => {
    const f = findingOf(demoChannel({ rampUpS: 2, holdS: 0, rampDownS: 2 }), "ramps-exceed-on-time");
    // common practice (no published source): the set amplitude must be held for a contraction at that level
    expect(f?.severity).toBe("blocks");
  });

  it("still shows the ramp block when another field is bad", () => {
    expect(findingCodes(demoChannel({ rampUpS: 2, holdS: 0, rampDownS: 2, daysPerWeek: 9 }))).toContain("ramps-exceed-on-time");
  });

  it("does not block a hold with ramps, nor a hold with no ramps", () => {
    expect(findingCodes(demoChannel())).not.toContain("ramps-exceed-on-time");
    const noRamps = findingCodes(demoChannel({ rampUpS: 0, rampDownS: 0 }));
    expect(noRamps).not.toContain("ramps-exceed-on-time");
    expect(noRamps).not.toContain("on-time-zero");
  });
});

describe("ramps-longer-than-hold (note)", () => {
  it("notes ramps that together outlast the hold", () => {
    // common practice (no published source): ramps of about 1–2 s
    expect(findingOf(demoChannel({ rampUpS: 2, holdS: 3, rampDownS: 2 }), "ramps-longer-than-hold")?.severity).toBe("note");
  });

  it("is silent when the hold is the longer part", () => {
    // common practice (no published source): ramps of about 1–2 s
    expect(findingCodes(demoChannel({ rampUpS: 2, holdS: 4, rampDownS: 2 }))).not.toContain("ramps-longer-than-hold");
  });
});
