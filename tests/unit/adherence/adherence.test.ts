import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { adherenceFor, cappedPercent, isUnderHalf, lastDays, programmeAdherence, weeklyAdherence, type LoggedSession, type VersionSchedule } from "@/lib/adherence";
import { addDays, daysBetween } from "@/lib/adherence";

// Invented schedules. 2 November 2026 is a Monday.
const v1: VersionSchedule = { number: 1, publishedOn: "2026-11-02", schedule: { minutesPerSession: 30, sessionsPerDay: 1, daysPerWeek: 5 } };
const v2: VersionSchedule = { number: 2, publishedOn: "2026-11-05", schedule: { minutesPerSession: 20, sessionsPerDay: 2, daysPerWeek: 5 } };
const sessions = (days: string[], minutes = 30): LoggedSession[] => days.map((sessionDate) => ({ sessionDate, minutes }));

describe("adherence against one version", () => {
  it("prescribes a whole week exactly and counts what was delivered", () => {
    // worked example (our own arithmetic): 1 session × 5 days = 5 sessions; × 30 min = 150 minutes.
    // 4 sessions of 30 min delivered: 4/5 = 80 % in sessions, 120/150 = 80 % in minutes.
    const week = adherenceFor("2026-11-02", "2026-11-08", [v1], sessions(["2026-11-02", "2026-11-03", "2026-11-05", "2026-11-06"]));
    expect(week.prescribedSessions).toBeCloseTo(5, 10);
    expect(week.prescribedMinutes).toBeCloseTo(150, 10);
    expect(week.deliveredSessions).toBe(4);
    expect(week.deliveredMinutes).toBe(120);
    expect(week.sessionsRatio).toBeCloseTo(0.8, 10);
    expect(week.minutesRatio).toBeCloseTo(0.8, 10);
  });

  it("counts sessions and minutes separately when sessions run short", () => {
    // worked example (our own arithmetic): 5 sessions of 15 min against 5 × 30: 100 % in sessions, 75/150 = 50 % in minutes.
    const week = adherenceFor("2026-11-02", "2026-11-08", [v1], sessions(["2026-11-02", "2026-11-03", "2026-11-04", "2026-11-05", "2026-11-06"], 15));
    expect(week.sessionsRatio).toBeCloseTo(1, 10);
    expect(week.minutesRatio).toBeCloseTo(0.5, 10);
  });
});

describe("a version change part-way through a week", () => {
  it("measures each day against the version in force that day", () => {
    // worked example (our own arithmetic): v1 (1 × 30 min, 5 d/wk) Monday–Wednesday, v2 (2 × 20 min, 5 d/wk) from
    // Thursday, the day it was published. Sessions = 3·(1·5/7) + 4·(2·5/7) = 15/7 + 40/7 = 55/7 ≈ 7.857.
    // Minutes = 3·(150/7) + 4·(200/7) = 450/7 + 800/7 = 1250/7 ≈ 178.57.
    const logged = [...sessions(["2026-11-02", "2026-11-04"], 30), ...sessions(["2026-11-05", "2026-11-05", "2026-11-06", "2026-11-07"], 20)];
    const week = adherenceFor("2026-11-02", "2026-11-08", [v1, v2], logged);
    expect(week.prescribedSessions).toBeCloseTo(55 / 7, 10);
    expect(week.prescribedMinutes).toBeCloseTo(1250 / 7, 10);
    // worked example (our own arithmetic): 6 sessions and 60 + 80 = 140 minutes delivered:
    // 6 ÷ 55/7 = 42/55 ≈ 76.4 %; 140 ÷ 1250/7 = 980/1250 = 78.4 %.
    expect(week.deliveredSessions).toBe(6);
    expect(week.deliveredMinutes).toBe(140);
    expect(week.sessionsRatio).toBeCloseTo(42 / 55, 10);
    expect(week.minutesRatio).toBeCloseTo(0.784, 10);
  });

  it("takes the versions in any order", () => {
    const a = adherenceFor("2026-11-02", "2026-11-08", [v2, v1], []);
    const b = adherenceFor("2026-11-02", "2026-11-08", [v1, v2], []);
    expect(a.prescribedMinutes).toBe(b.prescribedMinutes);
  });
});

describe("the edges of a programme", () => {
  const wednesdayStart: VersionSchedule = { ...v1, publishedOn: "2026-11-04" };

  it("prescribes nothing before the first version, so a first week starting on Wednesday is shorter", () => {
    // worked example (our own arithmetic): Wednesday–Sunday is 5 days × 5/7 = 25/7 ≈ 3.571 sessions, 750/7 ≈ 107.1 min.
    const [first] = weeklyAdherence([wednesdayStart], [], "2026-11-20");
    expect(first).toMatchObject({ from: "2026-11-02", to: "2026-11-08" });
    expect(first!.prescribedSessions).toBeCloseTo(25 / 7, 10);
    expect(first!.prescribedMinutes).toBeCloseTo(750 / 7, 10);
  });

  it("counts a session logged before the programme began but prescribes nothing for that day", () => {
    const monday = adherenceFor("2026-11-02", "2026-11-02", [wednesdayStart], sessions(["2026-11-02"]));
    expect(monday.prescribedSessions).toBe(0);
    expect(monday.deliveredSessions).toBe(1);
    expect(monday.sessionsRatio).toBeNull();
  });

  it("cuts the current week off at today", () => {
    // worked example (our own arithmetic): the week of Monday 16 November to Wednesday 18th is 3 × 5/7 = 15/7 sessions.
    const weeks = weeklyAdherence([v1], [], "2026-11-18");
    expect(weeks.map((w) => w.from)).toEqual(["2026-11-02", "2026-11-09", "2026-11-16"]);
    expect(weeks[2]!.to).toBe("2026-11-18");
    expect(weeks[2]!.prescribedSessions).toBeCloseTo(15 / 7, 10);
  });

  it("reads the last seven days across a week boundary", () => {
    // worked example (our own arithmetic): Thursday 12 to Wednesday 18 November under v1 = 7 × 5/7 = 5 sessions;
    // 2 sessions logged in that window (the one on the 11th is outside it): 40 %, under half.
    const window = lastDays(7, "2026-11-18", [v1], sessions(["2026-11-11", "2026-11-13", "2026-11-17"]));
    expect(window.from).toBe("2026-11-12");
    expect(window.prescribedSessions).toBeCloseTo(5, 10);
    expect(window.deliveredSessions).toBe(2);
    expect(isUnderHalf(window)).toBe(true);
  });

  it("totals the programme to date over several weeks and two versions", () => {
    // worked example (our own arithmetic): v1 on 2–4 November (3 days), v2 from 5 to 15 November (11 days):
    // sessions = 3·5/7 + 11·10/7 = 125/7 ≈ 17.86; minutes = 3·150/7 + 11·200/7 = 2650/7 ≈ 378.6.
    const total = programmeAdherence([v1, v2], [], "2026-11-15")!;
    expect(total.from).toBe("2026-11-02");
    expect(total.prescribedSessions).toBeCloseTo(125 / 7, 10);
    expect(total.prescribedMinutes).toBeCloseTo(2650 / 7, 10);
  });

  it("caps the percentage shown at 100 but keeps the ratio", () => {
    expect(cappedPercent(1.4)).toBe(100);
    expect(cappedPercent(0.786)).toBe(79);
    expect(cappedPercent(null)).toBeNull();
  });

  it("refuses days that are not days and negative minutes", () => {
    expect(() => adherenceFor("2026-11-02", "2026-11-08", [v1], [{ sessionDate: "yesterday", minutes: 10 }])).toThrow(/yyyy-mm-dd/);
    expect(() => adherenceFor("2026-11-02", "2026-11-08", [v1], [{ sessionDate: "2026-11-03", minutes: -5 }])).toThrow(/0 or more/);
    expect(() => adherenceFor("2026-11-08", "2026-11-02", [v1], [])).toThrow(/comes after/);
  });
});

describe("laws that hold whatever the input", () => {
  const schedule = fc.record({ minutesPerSession: fc.integer({ min: 1, max: 120 }), sessionsPerDay: fc.integer({ min: 1, max: 6 }), daysPerWeek: fc.integer({ min: 1, max: 7 }) });
  const dayIndex = fc.integer({ min: 0, max: 60 });
  const day = (n: number) => addDays("2026-11-02", n);

  it("a whole week under one version prescribes sessionsPerDay × daysPerWeek", () => {
    // common practice (no published source): "n days a week" means n sessions-days in any 7 days.
    fc.assert(
      fc.property(schedule, dayIndex, (s, start) => {
        const version = { number: 1, publishedOn: day(0), schedule: s };
        const week = adherenceFor(day(start), day(start + 6), [version], []);
        return Math.abs(week.prescribedSessions - s.sessionsPerDay * s.daysPerWeek) < 1e-9;
      }),
    );
  });

  it("a period's totals are the sum of its days'", () => {
    fc.assert(
      fc.property(schedule, schedule, dayIndex, dayIndex, fc.array(dayIndex, { maxLength: 20 }), (s1, s2, change, length, logged) => {
        const versions = [
          { number: 1, publishedOn: day(0), schedule: s1 },
          { number: 2, publishedOn: day(change), schedule: s2 },
        ];
        const log = logged.map((n) => ({ sessionDate: day(n), minutes: 10 }));
        const whole = adherenceFor(day(0), day(length), versions, log);
        const parts = daysBetween(day(0), day(length)).map((d) => adherenceFor(d, d, versions, log));
        const sum = (key: "prescribedMinutes" | "deliveredSessions") => parts.reduce((total, p) => total + p[key], 0);
        return Math.abs(whole.prescribedMinutes - sum("prescribedMinutes")) < 1e-6 && whole.deliveredSessions === sum("deliveredSessions");
      }),
    );
  });

  it("logging one more session never lowers adherence", () => {
    fc.assert(
      fc.property(schedule, fc.array(dayIndex, { maxLength: 15 }), dayIndex, (s, logged, extra) => {
        const versions = [{ number: 1, publishedOn: day(0), schedule: s }];
        const log = logged.map((n) => ({ sessionDate: day(n), minutes: 20 }));
        const before = adherenceFor(day(0), day(60), versions, log);
        const after = adherenceFor(day(0), day(60), versions, [...log, { sessionDate: day(extra), minutes: 20 }]);
        return after.sessionsRatio! >= before.sessionsRatio! && after.minutesRatio! >= before.minutesRatio!;
      }),
    );
  });
});
