import { describe, expect, it } from "vitest";
import {
  analyseChannel,
  currentDensityMaPerCm2,
  electrodeAreaCm2,
  energyPerPhaseMj,
  phaseChargeUc,
  pulsePhases,
  rmsCurrentMa,
  shannonK,
  chargeDensityUcPerCm2,
} from "@/lib/stim";
import { demoChannel, expectRelClose, round, square } from "./helpers";

/** Every row of the "Check values" table in REFERENCES.md, at its relative tolerance of 1e-3. */
describe("check values", () => {
  it("1 mA for 1 ms is 1 µC", () => {
    // source: textbook definition of charge
    expectRelClose(phaseChargeUc(1, 1000), 1.0);
  });

  it("50 mA × 100 µs and 25 mA × 200 µs both carry 5 µC", () => {
    // source: electrotherapy teaching example
    expectRelClose(phaseChargeUc(50, 100), 5.0);
    // source: electrotherapy teaching example
    expectRelClose(phaseChargeUc(25, 200), 5.0);
  });

  it("50 mA r.m.s. on 25 cm² is exactly the 2 mA/cm² warning level", () => {
    // source: secondary quote of the standard (IEC 60601-2-10:2012 warning level; secondary)
    expectRelClose(currentDensityMaPerCm2(50, 25), 2.0);
  });

  it("a 2 in × 2 in square is 25.806 cm²", () => {
    // source: Forrester & Petrofsky (25.8)
    expectRelClose(electrodeAreaCm2(square(2, "in")), 25.806);
    // source: Forrester & Petrofsky (25.8), the figure as the paper rounds it
    expectRelClose(electrodeAreaCm2(square(2, "in")), 25.8);
  });

  it("a 2 in round is 20.268 cm²", () => {
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
    expectRelClose(electrodeAreaCm2(round(2, "in")), 20.268);
  });

  it("monophasic 50 mA, 300 µs, 35 Hz on a 2 in round", () => {
    const r = analyseChannel(
      demoChannel({
        amplitudeCeilingMa: 50,
        phaseDurationUs: 300,
        frequencyHz: 35,
        waveform: { kind: "monophasic" },
        electrodes: [round(2, "in"), round(2, "in")],
      }),
    );
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
    expectRelClose(r.derived?.current.rmsTrainMa, 5.123);
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
    expectRelClose(r.derived?.dose.currentDensityMaPerCm2, 0.2528);
  });

  it("symmetric biphasic 50 mA, 300 µs per phase, 35 Hz on a 2 in round", () => {
    const r = analyseChannel(
      demoChannel({
        amplitudeCeilingMa: 50,
        phaseDurationUs: 300,
        frequencyHz: 35,
        waveform: { kind: "symmetric-biphasic" },
        electrodes: [round(2, "in"), round(2, "in")],
      }),
    );
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
    expectRelClose(r.derived?.current.rmsTrainMa, 7.246);
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
    expectRelClose(r.derived?.dose.currentDensityMaPerCm2, 0.3575);
  });

  describe("symmetric biphasic 100 mA, 400 µs, 50 Hz", () => {
    const settings = { amplitudeCeilingMa: 100, phaseDurationUs: 400, frequencyHz: 50 };

    it("gives 20 mA r.m.s. and 0.800 mA/cm² on 25 cm² with no density warning", () => {
      const r = analyseChannel(demoChannel({ ...settings, electrodes: [square(5), square(5)] }));
      // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
      expectRelClose(r.derived?.current.rmsTrainMa, 20.0);
      // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
      expectRelClose(r.derived?.dose.currentDensityMaPerCm2, 0.8);
      expect(r.findings.map((f) => f.code)).not.toContain("current-density-high");
    });

    it("gives 2.487 mA/cm² on a 3.2 cm round, with the density warning", () => {
      const r = analyseChannel(demoChannel({ ...settings, electrodes: [round(3.2), round(3.2)] }));
      // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
      expectRelClose(r.derived?.dose.currentDensityMaPerCm2, 2.487);
      // source: secondary quote of the standard (IEC 60601-2-10:2012, 2 mA/cm² read as r.m.s.; secondary)
      expect(r.findings.find((f) => f.code === "current-density-high")?.severity).toBe("warning");
    });
  });

  it("100 mA for 400 µs into 500 Ω is 2 mJ per phase, far below 300 mJ", () => {
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
    expectRelClose(energyPerPhaseMj(100, 400), 2.0);
    const r = analyseChannel(demoChannel({ amplitudeCeilingMa: 100, phaseDurationUs: 400, frequencyHz: 50 }));
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
    expectRelClose(r.derived?.dose.maxEnergyPerPhaseMj, 2.0);
    // source: earlier edition of IEC 60601-2-10, 300 mJ per pulse into 500 Ω (secondary)
    expect(r.findings.map((f) => f.code)).not.toContain("energy-per-pulse-high");
  });

  it("Shannon: 15 µC on 20.268 cm² gives D 0.7401 µC/cm² and k 1.045", () => {
    const d = chargeDensityUcPerCm2(15, 20.268);
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
    expectRelClose(d, 0.7401);
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic); Shannon (1992) model
    expectRelClose(shannonK(d, 15), 1.045);
    // 50 mA × 300 µs on a 2 in round is the same 15 µC, reached through the whole pipeline.
    const r = analyseChannel(demoChannel({ amplitudeCeilingMa: 50, phaseDurationUs: 300, electrodes: [round(2, "in"), round(2, "in")] }));
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
    expectRelClose(r.derived?.dose.chargeDensityUcPerCm2, 0.7401);
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic); Shannon (1992) model
    expectRelClose(r.derived?.dose.shannon.k, 1.045);
    expect(r.derived?.dose.shannon.label).toMatch(/information only.*brain tissue.*not a skin limit/i);
  });

  it("the r.m.s. helper agrees with the monophasic closed form on the same row", () => {
    const phases = pulsePhases({ phaseDurationUs: 300, amplitudeCeilingMa: 50, waveform: { kind: "monophasic" } });
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
    expectRelClose(rmsCurrentMa(phases, 35), 5.123);
  });
});
