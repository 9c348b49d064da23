import { describe, expect, it } from "vitest";
import { adherenceByWeek, adherenceOver, adherenceOverLastDays, isUnderHalf, prescriptionOn, programmeLastDay, programmeToDate } from "@/lib/adherence";
import { input, logged, MON, THU, v1, v2, version, WED } from "./fixtures";

describe("a first week starting mid-week", () => {
  const fromWednesday = version(1, WED);

  it("prescribes only from the day of publication", () => {
    // worked example (our own arithmetic): Wednesday–Sunday is 5 days × 5/7 = 25/7 ≈ 3.571 sessions and
    // 5 × 150/7 = 750/7 ≈ 107.1 minutes; 3 sessions of 30 min = 21/25 = 84 % both ways.
    const [first] = adherenceByWeek(input([fromWednesday], logged(30, WED, THU, "2026-11-07")), "2026-11-20");
    expect(first).toMatchObject({ weekOf: MON, from: MON, to: "2026-11-08", complete: true, prescribedDays: 5 });
    expect(first!.sessions.prescribed).toBeCloseTo(25 / 7, 12);
    expect(first!.minutes.prescribed).toBeCloseTo(750 / 7, 12);
    expect(first!.sessions.ratio).toBeCloseTo(0.84, 12);
    expect(first!.minutes.ratio).toBeCloseTo(0.84, 12);
  });

  it("has nothing prescribed on the days before the first version", () => {
    // worked example (our own arithmetic): Monday and Tuesday come before Wednesday's publication.
    expect(prescriptionOn(input([fromWednesday]), "2026-11-03")).toBeNull();
    const before = adherenceOver(input([fromWednesday]), { from: MON, to: "2026-11-03" });
    expect(before.sessions).toEqual({ prescribed: 0, delivered: 0, ratio: null, cappedPercent: null });
    expect(isUnderHalf(before)).toBe(false);
    // worked example (our own arithmetic): there is no programme on the Tuesday yet, and none to date.
    expect(programmeToDate(input([fromWednesday]), "2026-11-03")).toBeNull();
    expect(adherenceByWeek(input([fromWednesday]), "2026-11-03")).toEqual([]);
  });

  it("counts a check-in on a day with no prescription, and says so", () => {
    // worked example (our own arithmetic): one 30-min check-in on Tuesday (before publication) and one on
    // Thursday: 2 delivered of 25/7 prescribed = 14/25 = 56 %; one of them, 30 minutes, on an unprescribed day.
    const [first] = adherenceByWeek(input([fromWednesday], logged(30, "2026-11-03", THU)), "2026-11-08");
    expect(first!.sessions.delivered).toBe(2);
    expect(first!.sessions.ratio).toBeCloseTo(14 / 25, 12);
    expect(first!.onUnprescribedDays).toEqual({ sessions: 1, minutes: 30 });
    // worked example (our own arithmetic): a day on its own with nothing prescribed has no ratio, whatever was done.
    const tuesday = adherenceOver(input([fromWednesday], logged(30, "2026-11-03")), { from: "2026-11-03", to: "2026-11-03" });
    expect(tuesday.sessions).toMatchObject({ delivered: 1, ratio: null, cappedPercent: null });
  });
});

describe("the version in force", () => {
  it("is the newer one from the day it is published", () => {
    // worked example (our own arithmetic): v2 is published on Thursday, so Wednesday is v1 (1·5/7 sessions a day)
    // and Thursday is v2 (2·5/7 = 10/7 sessions, 200/7 minutes).
    expect(prescriptionOn(input([v1, v2]), WED)).toMatchObject({ versionId: "ver-1", versionNumber: 1, sessions: 5 / 7 });
    expect(prescriptionOn(input([v1, v2]), THU)).toMatchObject({ versionId: "ver-2", versionNumber: 2, sessions: 10 / 7, minutes: 200 / 7 });
  });

  it("is the higher number when two are published on the same day", () => {
    // worked example (our own arithmetic): v3, published the same Thursday as v2 with 3 sessions a day: 15/7.
    const v3 = version(3, THU, { sessionsPerDay: 3 });
    expect(prescriptionOn(input([v1, v3, v2]), THU)).toMatchObject({ versionNumber: 3, sessions: 15 / 7 });
  });
});

describe("the end of the programme", () => {
  const twoWeeks = version(1, MON, { weeks: 2 });

  it("comes `weeks` weeks after the first version's day", () => {
    // worked example (our own arithmetic): 2 November + 2 × 7 days = 16 November, so the last day is the 15th.
    expect(programmeLastDay(input([twoWeeks]), "2026-11-20")).toBe("2026-11-15");
    expect(prescriptionOn(input([twoWeeks]), "2026-11-15")).not.toBeNull();
    expect(prescriptionOn(input([twoWeeks]), "2026-11-16")).toBeNull();
    // worked example (our own arithmetic): to 30 November only 14 days prescribe: 14 × 5/7 = 10 sessions.
    expect(programmeToDate(input([twoWeeks]), "2026-11-30")!.sessions.prescribed).toBe(10);
  });

  it("takes `weeks` from the version in force, still counted from the first version's day", () => {
    // worked example (our own arithmetic): v2 on 12 November raises weeks to 4: 2 November + 28 days − 1 = 29th.
    const longer = version(2, "2026-11-12", { weeks: 4 });
    expect(programmeLastDay(input([twoWeeks, longer]), "2026-11-20")).toBe("2026-11-29");
    expect(prescriptionOn(input([twoWeeks, longer]), "2026-11-29")).toMatchObject({ versionNumber: 2 });
    expect(prescriptionOn(input([twoWeeks, longer]), "2026-11-30")).toBeNull();
    // worked example (our own arithmetic): a new version with weeks unchanged does not restart the clock.
    const sameLength = version(2, "2026-11-12", { weeks: 2 });
    expect(prescriptionOn(input([twoWeeks, sameLength]), "2026-11-16")).toBeNull();
  });

  it("leaves a check-in after the end as delivered on an unprescribed day", () => {
    // worked example (our own arithmetic): the week of 16 November is after the end: nothing prescribed, no ratio.
    const weeks = adherenceByWeek(input([twoWeeks], logged(30, "2026-11-17")), "2026-11-22");
    expect(weeks[2]).toMatchObject({ weekOf: "2026-11-16", prescribedDays: 0, onUnprescribedDays: { sessions: 1, minutes: 30 } });
    expect(weeks[2]!.sessions.ratio).toBeNull();
  });
});

describe("calendar weeks and the rolling window", () => {
  it("cuts the current week off at today and marks it incomplete", () => {
    // worked example (our own arithmetic): Monday 16 to Wednesday 18 November = 3 × 5/7 = 15/7 sessions.
    const weeks = adherenceByWeek(input([v1]), "2026-11-18");
    expect(weeks.map((w) => [w.weekOf, w.to, w.complete])).toEqual([
      [MON, "2026-11-08", true],
      ["2026-11-09", "2026-11-15", true],
      ["2026-11-16", "2026-11-18", false],
    ]);
    expect(weeks[2]!.sessions.prescribed).toBeCloseTo(15 / 7, 12);
  });

  it("reads the last 7 days across a week boundary", () => {
    // worked example (our own arithmetic): Thursday 12 to Wednesday 18 November, 7 × 5/7 = 5 sessions, 150 min.
    // Check-ins on the 13th and 17th count; the 11th is outside. 2 / 5 = 40 %, 60 / 150 = 40 %: under half.
    const window = adherenceOverLastDays(input([v1], logged(30, "2026-11-11", "2026-11-13", "2026-11-17")), 7, "2026-11-18");
    expect(window).toMatchObject({ from: "2026-11-12", to: "2026-11-18" });
    expect(window.sessions).toMatchObject({ prescribed: 5, delivered: 2, ratio: 0.4 });
    expect(window.minutes).toMatchObject({ prescribed: 150, delivered: 60, ratio: 0.4 });
    expect(isUnderHalf(window)).toBe(true);
  });

  it("reads a window across a version change", () => {
    // worked example (our own arithmetic): Tuesday 3 to Monday 9 November: v1 on 2 days, v2 on 5:
    // 2·5/7 + 5·10/7 = 60/7 ≈ 8.571 sessions. 4 done = 28/60 ≈ 46.7 % (under half); 5 done = 35/60 ≈ 58.3 %.
    const window = (n: number) => adherenceOverLastDays(input([v1, v2], logged(20, ...Array<string>(n).fill("2026-11-06"))), 7, "2026-11-09");
    expect(window(4).sessions.prescribed).toBeCloseTo(60 / 7, 12);
    expect(window(4).sessions.ratio).toBeCloseTo(28 / 60, 12);
    expect(isUnderHalf(window(4), "sessions")).toBe(true);
    expect(isUnderHalf(window(5), "sessions")).toBe(false);
  });
});
