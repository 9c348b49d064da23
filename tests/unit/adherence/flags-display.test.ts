import { describe, expect, it } from "vitest";
import { adherenceOver, isUnderHalf, percentForDisplay } from "@/lib/adherence";
import { input, logged, MON, v1, version } from "./fixtures";

// One full week, Monday 2 to Sunday 8 November.
const days = (n: number) => Array.from({ length: n }, (_, i) => `2026-11-0${2 + (i % 7)}`);
const week = (versions = [v1], checkIns = logged(30, ...days(5))) => adherenceOver(input(versions, checkIns), { from: MON, to: "2026-11-08" });

describe("under half", () => {
  // common practice (no published source): the daily rule flags adherence under half over the last 7 days.
  const twiceDaily = version(1, MON, { sessionsPerDay: 2, daysPerWeek: 7 });

  it("is not reached at exactly half", () => {
    // worked example (our own arithmetic): 2 × 7 = 14 sessions; 7 logged = 50 %, 6 logged = 42.9 %.
    expect(isUnderHalf(week([twiceDaily], logged(30, ...days(7))))).toBe(false);
    expect(isUnderHalf(week([twiceDaily], logged(30, ...days(6))))).toBe(true);
  });

  it("is reached by minutes alone when sessions run short", () => {
    // worked example (our own arithmetic): 5 sessions of 10 min: 100 % of sessions, 50/150 = 33 % of minutes.
    const result = week([v1], logged(10, ...days(5)));
    expect([isUnderHalf(result), isUnderHalf(result, "minutes"), isUnderHalf(result, "sessions")]).toEqual([true, true, false]);
  });

  it("is reached by sessions alone when the minutes are crammed into few sessions", () => {
    // worked example (our own arithmetic): 2 sessions of 90 min: 2/5 = 40 % of sessions, 180/150 = 120 % of minutes.
    const result = week([v1], logged(90, ...days(2)));
    expect([isUnderHalf(result), isUnderHalf(result, "minutes"), isUnderHalf(result, "sessions")]).toEqual([true, false, true]);
    // worked example (our own arithmetic): the raw ratio keeps 1.2; the percentage shown stops at 100.
    expect(result.minutes.ratio).toBeCloseTo(1.2, 12);
    expect(result.minutes.cappedPercent).toBe(100);
    expect(percentForDisplay(result.minutes)).toBe(100);
  });

  it("is never reached when nothing was prescribed", () => {
    // worked example (our own arithmetic): before the first version there is nothing to fall short of.
    const before = adherenceOver(input([version(1, "2026-11-09")]), { from: MON, to: "2026-11-08" });
    expect(isUnderHalf(before)).toBe(false);
    expect(percentForDisplay(before.sessions)).toBeNull();
  });
});

describe("the percentage shown", () => {
  it("is rounded down, so a figure just short of a cut-off never reads as meeting it", () => {
    // worked example (our own arithmetic): 119.4 of 150 minutes = 79.6 %: shown 79, never 80 (the 80 % cut-off is
    // from memory, unverified; the rounding rule is ours).
    const result = week([v1], [...logged(30, ...days(3)), { sessionDate: "2026-11-05", minutes: 29.4 }]);
    expect(result.minutes.cappedPercent).toBeCloseTo(79.6, 10);
    expect(percentForDisplay(result.minutes)).toBe(79);
  });

  it("does not lose a whole percent to floating-point rounding", () => {
    // worked example (our own arithmetic): 29 of 100 minutes is 29 %, although 0.29 × 100 is 28.999… in floating point.
    const hundred = version(1, MON, { minutesPerSession: 100, daysPerWeek: 7 });
    const day = adherenceOver(input([hundred], logged(29, MON)), { from: MON, to: MON });
    expect(day.minutes.cappedPercent).toBeLessThan(29);
    expect(percentForDisplay(day.minutes)).toBe(29);
  });
});
