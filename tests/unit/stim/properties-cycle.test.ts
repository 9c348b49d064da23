import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { analyseChannel, deriveChannel, deriveSession, SEVERITY_ORDER } from "@/lib/stim";
import { arbSettings } from "./arbitraries";
import { expectRelClose } from "./helpers";

const TOL = 1e-9;

describe("cycle and session laws", () => {
  it("the cycle-averaged r.m.s. never exceeds the train r.m.s., and counting the ramps never lowers it", () => {
    fc.assert(
      fc.property(arbSettings, (s) => {
        const c = deriveChannel(s).current;
        // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): sqrt(on/(on+rest)) ≤ 1
        expect(c.rmsCycleRampsIgnoredMa).not.toBeNull();
        expect(c.rmsCycleRampsIgnoredMa as number).toBeLessThanOrEqual((c.rmsCycleRampsAsOnMa as number) * (1 + TOL));
        expect(c.rmsCycleRampsAsOnMa as number).toBeLessThanOrEqual(c.rmsTrainMa * (1 + TOL));
      }),
    );
  });

  it("a session of whole cycles is stimulated for exactly the duty cycle", () => {
    fc.assert(
      fc.property(arbSettings, fc.integer({ min: 1, max: 200 }), (s, n) => {
        const cycle = deriveChannel(s).cycle;
        const session = deriveSession({ ...s, sessionMinutes: (n * cycle.cycleLengthS) / 60 });
        // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
        expect(session.contractionsPerSession).toBe(n);
        expectRelClose(session.stimulatedShareOfSession, cycle.onShareRampsAsOn as number, 1e-9);
        expectRelClose(session.fullIntensityShareOfSession, s.holdS / cycle.cycleLengthS, 1e-9);
      }),
    );
  });

  it("shares stay between 0 and 1, and full intensity never exceeds time stimulated", () => {
    fc.assert(
      fc.property(arbSettings, (s) => {
        const x = deriveSession(s);
        // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
        expect(x.fullIntensityShareOfSession).toBeGreaterThanOrEqual(0);
        expect(x.fullIntensityShareOfSession).toBeLessThanOrEqual(x.stimulatedShareOfSession * (1 + TOL));
        expect(x.stimulatedShareOfSession).toBeLessThanOrEqual(1 + TOL);
      }),
    );
  });

  it("counts every contraction that finishes within the session, and no more", () => {
    fc.assert(
      fc.property(arbSettings, (s) => {
        const { cycleLengthS, onTimeWithRampsS } = deriveChannel(s).cycle;
        const n = deriveSession(s).contractionsPerSession;
        const sessionS = s.sessionMinutes * 60;
        // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic):
        // contraction k (from 0) ends at k·cycle + on, and must end by the session's end
        if (n > 0) expect((n - 1) * cycleLengthS + onTimeWithRampsS).toBeLessThanOrEqual(sessionS * (1 + TOL));
        expect(n * cycleLengthS + onTimeWithRampsS).toBeGreaterThan(sessionS * (1 - TOL));
      }),
    );
  });

  it("weekly minutes are the session's minutes times the sessions in a week", () => {
    fc.assert(
      fc.property(arbSettings, (s) => {
        const x = deriveSession(s);
        // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
        expectRelClose(x.fullIntensityMinutesPerWeek, x.fullIntensityMinutesPerSession * s.sessionsPerDay * s.daysPerWeek, TOL);
      }),
    );
  });
});

describe("analysis laws", () => {
  it("never throws, and anything it cannot parse blocks", () => {
    fc.assert(
      fc.property(fc.anything(), (input) => {
        const r = analyseChannel(input);
        if (r.settings === undefined) {
          expect(r.ok).toBe(false);
          expect(r.findings.some((f) => f.severity === "blocks")).toBe(true);
        }
      }),
    );
  });

  it("keeps random damage to valid settings from slipping through", () => {
    const keys = ["frequencyHz", "phaseDurationUs", "holdS", "restS", "amplitudeCeilingMa", "sessionMinutes"] as const;
    fc.assert(
      fc.property(arbSettings, fc.constantFrom(...keys), fc.constantFrom(-1, 0, Number.NaN, "12", null), (s, key, bad) => {
        // holdS and restS may be zero, so zero is not damage for them.
        if (bad === 0 && (key === "holdS" || key === "restS")) return;
        const r = analyseChannel({ ...s, [key]: bad });
        expect(r.ok).toBe(false);
        expect(r.findings).toContainEqual(expect.objectContaining({ severity: "blocks", field: key }));
      }),
    );
  });

  it("sorts findings blocks → warning → note", () => {
    fc.assert(
      fc.property(arbSettings, (s) => {
        const order = analyseChannel(s).findings.map((f) => SEVERITY_ORDER[f.severity]);
        expect(order).toEqual([...order].sort((a, b) => a - b));
      }),
    );
  });

  it("every warning and note defers to the treating clinician and the manufacturer's instructions", () => {
    fc.assert(
      fc.property(arbSettings, (s) => {
        for (const f of analyseChannel(s).findings) {
          expect(f.source.length).toBeGreaterThan(0);
          if (f.severity === "blocks") continue;
          expect(f.explanation).toMatch(/treating clinician/);
          expect(f.explanation).toMatch(/manufacturer's instructions/);
        }
      }),
    );
  });

  it("is ok exactly when nothing blocks", () => {
    fc.assert(
      fc.property(arbSettings, (s) => {
        const r = analyseChannel(s);
        expect(r.ok).toBe(!r.findings.some((f) => f.severity === "blocks"));
        expect(r.findings.filter((f) => f.code === "frequency-band")).toHaveLength(1);
      }),
    );
  });
});
