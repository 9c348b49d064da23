import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  averageAbsoluteCurrentMa,
  currentDensityMaPerCm2,
  deriveChannel,
  netChargeUc,
  phaseChargeUc,
  pulsePeriodUs,
  pulsePhases,
  pulseWidthUs,
  interphaseGapUs,
  rmsCurrentMa,
  withAmplitudeCeiling,
} from "@/lib/stim";
import { arbScale, arbSettings } from "./arbitraries";
import { expectRelClose } from "./helpers";

const TOL = 1e-9;
const pos = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

describe("pulse laws", () => {
  it("r.m.s. current scales linearly with amplitude", () => {
    fc.assert(
      fc.property(arbSettings, arbScale, (s, k) => {
        const base = rmsCurrentMa(pulsePhases(s, s.amplitudeCeilingMa), s.frequencyHz);
        const scaled = rmsCurrentMa(pulsePhases(s, s.amplitudeCeilingMa * k), s.frequencyHz);
        // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): sqrt(f·Σ I_k²·t_k) is linear in I
        expectRelClose(scaled, k * base, TOL);
      }),
    );
  });

  it("the general r.m.s. formula matches the closed forms for monophasic and symmetric biphasic pulses", () => {
    fc.assert(
      fc.property(pos(0.1, 200), pos(10, 1000), pos(1, 200), (i, t, f) => {
        const mono = pulsePhases({ amplitudeCeilingMa: i, phaseDurationUs: t, waveform: { kind: "monophasic" } });
        const sym = pulsePhases({ amplitudeCeilingMa: i, phaseDurationUs: t, waveform: { kind: "symmetric-biphasic" } });
        // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): I·sqrt(t·f)
        expectRelClose(rmsCurrentMa(mono, f), i * Math.sqrt(t * 1e-6 * f), TOL);
        // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): I·sqrt(2·t·f)
        expectRelClose(rmsCurrentMa(sym, f), i * Math.sqrt(2 * t * 1e-6 * f), TOL);
      }),
    );
  });

  it("an interphase gap changes neither the r.m.s. current nor the charge", () => {
    fc.assert(
      fc.property(arbSettings, pos(0, 500), (s, gap) => {
        if (s.waveform.kind === "monophasic") return;
        const a = deriveChannel({ ...s, waveform: { ...s.waveform, interphaseGapUs: 0 } });
        const b = deriveChannel({ ...s, waveform: { ...s.waveform, interphaseGapUs: gap } });
        // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): "an interphase gap does not change it"
        expect(b.current.rmsTrainMa).toBe(a.current.rmsTrainMa);
        expect(b.pulse.netChargeUc).toBe(a.pulse.netChargeUc);
        // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): the gap adds to the pulse's length
        expect(b.pulse.pulseWidthUs - a.pulse.pulseWidthUs).toBeCloseTo(gap, 9);
      }),
    );
  });

  it("equal I·t products carry equal phase charge", () => {
    fc.assert(
      fc.property(pos(0.1, 200), pos(1, 1000), pos(0.05, 20), (i, t, k) => {
        // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): Q = I·t
        expectRelClose(phaseChargeUc(i * k, t / k), phaseChargeUc(i, t), TOL);
      }),
    );
  });

  it("balanced waveforms leave no net charge", () => {
    fc.assert(
      fc.property(pos(0.1, 200), pos(10, 1000), pos(10, 5000), (i, t, t2) => {
        const sym = pulsePhases({ amplitudeCeilingMa: i, phaseDurationUs: t, waveform: { kind: "symmetric-biphasic" } });
        // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): 0 for a balanced biphasic pulse
        expect(netChargeUc(sym)).toBe(0);
        const waveform = {
          kind: "asymmetric-balanced-biphasic" as const,
          secondPhaseAmplitudeMa: (i * t) / t2,
          secondPhaseDurationUs: t2,
        };
        for (const amplitude of [i, i / 3]) {
          const asym = pulsePhases({ amplitudeCeilingMa: i, phaseDurationUs: t, waveform }, amplitude);
          // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): Σ signed I_k·t_k = 0
          expect(Math.abs(netChargeUc(asym))).toBeLessThanOrEqual(phaseChargeUc(amplitude, t) * TOL);
        }
      }),
    );
  });

  it("average absolute current never exceeds the r.m.s. current while pulses fit in the period", () => {
    fc.assert(
      fc.property(arbSettings, (s) => {
        const phases = pulsePhases(s);
        if (pulseWidthUs(phases, interphaseGapUs(s.waveform)) >= pulsePeriodUs(s.frequencyHz)) return;
        // source: Cauchy–Schwarz inequality (standard mathematics) applied to the formulas in REFERENCES:
        // (f·Σ|I|t)² ≤ (f·Σ I²t)·(f·Σ t) and f·Σ t ≤ 1 when the pulses fit
        expect(averageAbsoluteCurrentMa(phases, s.frequencyHz)).toBeLessThanOrEqual(
          rmsCurrentMa(phases, s.frequencyHz) * (1 + TOL),
        );
      }),
    );
  });
});

describe("density laws", () => {
  it("current density scales linearly with the amplitude ceiling", () => {
    fc.assert(
      fc.property(arbSettings, pos(0.1, 10), (s, k) => {
        const a = deriveChannel(s).dose.currentDensityMaPerCm2;
        const b = deriveChannel(withAmplitudeCeiling(s, s.amplitudeCeilingMa * k)).dose.currentDensityMaPerCm2;
        // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): I_rms / A
        expectRelClose(b, k * a, TOL);
      }),
    );
  });

  it("density falls as the electrode grows", () => {
    fc.assert(
      fc.property(pos(0.1, 100), pos(1, 200), pos(1.001, 10), (i, area, grow) => {
        // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): I_rms / A
        expect(currentDensityMaPerCm2(i, area * grow)).toBeLessThan(currentDensityMaPerCm2(i, area));
      }),
    );
    fc.assert(
      fc.property(arbSettings, pos(1.001, 3), (s, grow) => {
        const bigger = s.electrodes.map((e) =>
          e.shape === "round"
            ? { ...e, diameter: e.diameter * grow }
            : e.shape === "square"
              ? { ...e, side: e.side * grow }
              : { ...e, width: e.width * grow, length: e.length * grow },
        ) as typeof s.electrodes;
        const before = deriveChannel(s).dose;
        const after = deriveChannel({ ...s, electrodes: bigger }).dose;
        // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): Q / A, P / A
        expect(after.currentDensityMaPerCm2).toBeLessThan(before.currentDensityMaPerCm2);
        expect(after.chargeDensityUcPerCm2).toBeLessThan(before.chargeDensityUcPerCm2);
        expect(after.powerDensityMwPerCm2).toBeLessThan(before.powerDensityMwPerCm2);
      }),
    );
  });

  it("the amplitude at the density limit gives exactly 2 mA/cm² when used as the ceiling", () => {
    fc.assert(
      fc.property(arbSettings, (s) => {
        const limit = deriveChannel(s).dose.amplitudeAtDensityLimitMa;
        const at = deriveChannel(withAmplitudeCeiling(s, limit)).dose.currentDensityMaPerCm2;
        // source: secondary quote of the standard (IEC 60601-2-10:2012, 2 mA/cm² read as r.m.s.; secondary)
        expectRelClose(at, 2, 1e-9);
      }),
    );
  });

  it("power and energy scale with the square of the amplitude", () => {
    fc.assert(
      fc.property(arbSettings, pos(0.1, 10), (s, k) => {
        const a = deriveChannel(s).dose;
        const b = deriveChannel(withAmplitudeCeiling(s, s.amplitudeCeilingMa * k)).dose;
        // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): P = I_rms²·R, E = I²·R·t
        expectRelClose(b.averagePowerMw, k * k * a.averagePowerMw, TOL);
        expectRelClose(b.energyPerPulseMj, k * k * a.energyPerPulseMj, TOL);
      }),
    );
  });

  it("Shannon's k equals log10(Q²/A)", () => {
    fc.assert(
      fc.property(arbSettings, (s) => {
        const d = deriveChannel(s);
        const q = d.pulse.maxPhaseChargeUc;
        // source: Shannon RV (1992), IEEE Trans Biomed Eng 39(4):424–426: log D = k − log Q, with D = Q / A
        // k is a logarithm and can be near 0, where a relative tolerance means nothing: compare within 1e-9 absolute.
        const expected = Math.log10((q * q) / d.electrodes.smallestAreaCm2);
        expect(Math.abs((d.dose.shannon.k as number) - expected)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(expected)));
      }),
    );
  });
});
