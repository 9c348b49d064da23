import { describe, expect, it } from "vitest";
import { demoChannel, expectRelClose, findingCodes, findingOf, round, square } from "./helpers";

describe("current-density-high (warning)", () => {
  const strong = { amplitudeCeilingMa: 100, phaseDurationUs: 400, frequencyHz: 50 };

  it("warns on a 3.2 cm round at 100 mA and gives the amplitude at which 2 mA/cm² is reached", () => {
    const f = findingOf(demoChannel({ ...strong, electrodes: [round(3.2), round(3.2)] }), "current-density-high");
    // source: secondary quote of the standard (IEC 60601-2-10:2012, 2 mA/cm² read as r.m.s.; secondary)
    expect(f?.severity).toBe("warning");
    expect(f?.source).toMatch(/IEC 60601-2-10:2012.*secondary/);
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic):
    // I_rms = I·sqrt(2tf) = 0.2·I, so density 2 mA/cm² on π·1.6² cm² is reached at 2·π·1.6² / 0.2 mA
    expectRelClose(f?.numbers?.amplitudeAtDensityLimitMa, (2 * Math.PI * 1.6 ** 2) / 0.2);
    expect(f?.explanation).toMatch(/80\.4 mA/);
    expect(f?.explanation).toMatch(/treating clinician/);
  });

  it("uses the smaller electrode when the pair differs", () => {
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): density on the smallest electrode
    expect(findingCodes(demoChannel({ ...strong, electrodes: [square(5), round(3.2)] }))).toContain("current-density-high");
  });

  it("does not warn at exactly 2 mA/cm²", () => {
    // I·sqrt(2·800 µs·100 Hz) = 125 mA × 0.4 = 50 mA r.m.s. on 25 cm²
    const exact = demoChannel({ amplitudeCeilingMa: 125, phaseDurationUs: 800, frequencyHz: 100, electrodes: [square(5), square(5)] });
    // source: secondary quote of the standard (IEC 60601-2-10:2012: "above" 2 mA/cm²; secondary)
    expect(findingCodes(exact)).not.toContain("current-density-high");
    // source: secondary quote of the standard (IEC 60601-2-10:2012: "above" 2 mA/cm²; secondary)
    expect(findingCodes({ ...exact, amplitudeCeilingMa: 126 })).toContain("current-density-high");
  });

  it("does not warn on 25 cm² at the same settings (0.8 mA/cm²)", () => {
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
    expect(findingCodes(demoChannel({ ...strong, electrodes: [square(5), square(5)] }))).not.toContain("current-density-high");
  });
});

describe("power-density-high (warning)", () => {
  // 200 mA, 1,000 µs per phase, 100 Hz: I_rms = 0.2·sqrt(0.2) A, P = I_rms²·500 = 4 W.
  const hot = { amplitudeCeilingMa: 200, phaseDurationUs: 1000, frequencyHz: 100 };

  it("warns above 0.25 W/cm² on a 1.25 in round", () => {
    const f = findingOf(demoChannel({ ...hot, electrodes: [round(1.25, "in"), round(1.25, "in")] }), "power-density-high");
    // source: FDA powered muscle stimulator guidance (1999) summary, 0.25 W/cm² (secondary)
    expect(f?.severity).toBe("warning");
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): P / A
    expectRelClose(f?.numbers?.powerDensityMwPerCm2, 4000 / (Math.PI * (1.25 * 1.27) ** 2));
  });

  it("does not warn at the same output on a 10 × 20 cm rectangle (20 mW/cm²)", () => {
    const big = { shape: "rectangle", width: 10, length: 20, unit: "cm" } as const;
    // source: FDA powered muscle stimulator guidance (1999) summary, 0.25 W/cm² (secondary)
    expect(findingCodes(demoChannel({ ...hot, electrodes: [big, big] }))).not.toContain("power-density-high");
  });
});

describe("energy-per-pulse-high (warning)", () => {
  it("warns for a 20 ms monophasic phase at 200 mA (400 mJ into 500 Ω)", () => {
    const long = demoChannel({ waveform: { kind: "monophasic" }, amplitudeCeilingMa: 200, phaseDurationUs: 20_000, frequencyHz: 10 });
    const f = findingOf(long, "energy-per-pulse-high");
    // source: earlier edition of IEC 60601-2-10, 300 mJ per pulse into 500 Ω (secondary)
    expect(f?.severity).toBe("warning");
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): I²·R·t
    expectRelClose(f?.numbers?.energyPerPulseMj, 0.2 ** 2 * 500 * 0.02 * 1000);
  });

  it("does not warn at 10 ms (200 mJ)", () => {
    const shorter = demoChannel({ waveform: { kind: "monophasic" }, amplitudeCeilingMa: 200, phaseDurationUs: 10_000, frequencyHz: 10 });
    // source: earlier edition of IEC 60601-2-10, 300 mJ per pulse into 500 Ω (secondary)
    expect(findingCodes(shorter)).not.toContain("energy-per-pulse-high");
  });
});

describe("net-charge-not-zero (warning)", () => {
  it("warns for a monophasic pulse, whose whole charge is net", () => {
    const f = findingOf(demoChannel({ waveform: { kind: "monophasic" }, amplitudeCeilingMa: 50 }), "net-charge-not-zero");
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): Σ signed I·t = 50 mA × 300 µs
    expectRelClose(f?.numbers?.netChargeUc, 15);
    expect(f?.severity).toBe("warning");
  });

  it("warns when the entered second phase does not balance the first", () => {
    const waveform = { kind: "asymmetric-balanced-biphasic", secondPhaseAmplitudeMa: 20, secondPhaseDurationUs: 500 } as const;
    const f = findingOf(demoChannel({ waveform, amplitudeCeilingMa: 50 }), "net-charge-not-zero");
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): 15 µC − 10 µC
    expectRelClose(f?.numbers?.netChargeUc, 5);
  });

  it("is silent for a balanced asymmetric pulse and for a symmetric one", () => {
    const waveform = { kind: "asymmetric-balanced-biphasic", secondPhaseAmplitudeMa: 15, secondPhaseDurationUs: 1000 } as const;
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): 50 × 300 = 15 × 1,000
    expect(findingCodes(demoChannel({ waveform, amplitudeCeilingMa: 50 }))).not.toContain("net-charge-not-zero");
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): 0 for a balanced biphasic pulse
    expect(findingCodes(demoChannel())).not.toContain("net-charge-not-zero");
  });
});
