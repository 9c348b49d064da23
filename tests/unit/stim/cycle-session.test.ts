import { describe, expect, it } from "vitest";
import { analyseChannel, cycleAveragedRmsMa, deriveCycle, deriveSession } from "@/lib/stim";
import { demoChannel, expectRelClose } from "./helpers";

// Demo cycle (invented): 1 s up, 5 s hold, 1 s down, 10 s rest, 30-minute sessions, twice a day, 5 days a week.
const cycle = { rampUpS: 1, holdS: 5, rampDownS: 1, restS: 10 };
const schedule = { ...cycle, sessionMinutes: 30, sessionsPerDay: 2, daysPerWeek: 5 };

describe("cycle figures", () => {
  it("counts the on time with and without the ramps, and the ratio both ways", () => {
    const c = deriveCycle(cycle);
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
    expect(c.cycleLengthS).toBe(17);
    expect(c.onTimeWithRampsS).toBe(7);
    expect(c.onTimeHoldOnlyS).toBe(5);
    expectRelClose(c.restPerOnWithRamps, 10 / 7);
    expectRelClose(c.restPerOnHoldOnly, 2);
    expectRelClose(c.onShareRampsIgnored, 5 / 15);
    expectRelClose(c.onShareRampsAsOn, 7 / 17);
  });

  it("has no ratio to show when the on time is zero", () => {
    const c = deriveCycle({ rampUpS: 0, holdS: 0, rampDownS: 0, restS: 10 });
    expect(c.restPerOnWithRamps).toBeNull();
    expect(c.restPerOnHoldOnly).toBeNull();
  });

  it("averages the r.m.s. over the cycle as I_rms·sqrt(on/(on+rest))", () => {
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
    expectRelClose(cycleAveragedRmsMa(20, 5, 15), 10);
    expect(cycleAveragedRmsMa(20, 0, 0)).toBeNull();
    const r = analyseChannel(demoChannel({ amplitudeCeilingMa: 100, phaseDurationUs: 400, frequencyHz: 50 }));
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): ramps ignored, 20 mA·sqrt(5/15)
    expectRelClose(r.derived?.current.rmsCycleRampsIgnoredMa, 20 * Math.sqrt(5 / 15));
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic): ramps counted, 20 mA·sqrt(7/17)
    expectRelClose(r.derived?.current.rmsCycleRampsAsOnMa, 20 * Math.sqrt(7 / 17));
  });

  it("keeps the whole train r.m.s. for continuous stimulation", () => {
    const r = analyseChannel(demoChannel({ restS: 0 }));
    expect(r.derived?.current.rmsCycleRampsIgnoredMa).toBe(r.derived?.current.rmsTrainMa);
  });
});

describe("session figures", () => {
  it("counts complete contractions and time stimulated in a session", () => {
    const s = deriveSession(schedule);
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic):
    // 1,800 s holds 105 whole 17 s cycles (1,785 s) and 15 s more, enough for the 106th contraction's 7 s
    expect(s.contractionsPerSession).toBe(106);
    expectRelClose(s.stimulatedMinutesPerSession, (105 * 7 + 7) / 60);
    expectRelClose(s.fullIntensityMinutesPerSession, (105 * 5 + 5) / 60);
    expectRelClose(s.fullIntensityMinutesPerWeek, ((105 * 5 + 5) / 60) * 10);
    expectRelClose(s.stimulatedShareOfSession, (106 * 7) / 1800);
    expect(s.sessionsPerWeek).toBe(10);
  });

  it("counts a partial last cycle only for the part that ran", () => {
    // 60 s of 17 s cycles: 3 whole (51 s) then 9 s: 1 s ramp-up, 5 s hold, 1 s down, 2 s of rest.
    const s = deriveSession({ ...schedule, sessionMinutes: 1 });
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
    expect(s.contractionsPerSession).toBe(4);
    // 40 s: 2 whole cycles (34 s) then 6 s: 1 s ramp-up and 5 s of the hold, but no ramp-down yet.
    const cut = deriveSession({ ...schedule, sessionMinutes: 40 / 60 });
    expect(cut.contractionsPerSession).toBe(2);
    expectRelClose(cut.fullIntensityMinutesPerSession, (2 * 5 + 5) / 60);
    expectRelClose(cut.stimulatedMinutesPerSession, (2 * 7 + 6) / 60);
  });

  it("delivers nothing when there is no on time", () => {
    const s = deriveSession({ ...schedule, rampUpS: 0, holdS: 0, rampDownS: 0 });
    expect(s.contractionsPerSession).toBe(0);
    expect(s.stimulatedShareOfSession).toBe(0);
  });
});
