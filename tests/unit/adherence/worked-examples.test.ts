import { describe, expect, it } from "vitest";
import { adherenceByWeek, adherenceOver, isUnderHalf, percentForDisplay, programmeToDate } from "@/lib/adherence";
import { input, logged, MON, THU, v1, v2 } from "./fixtures";

const week = { from: MON, to: "2026-11-08" };

describe("a plain full week under one version", () => {
  const result = adherenceOver(input([v1], logged(30, MON, "2026-11-03", THU, "2026-11-06")), week);

  it("prescribes sessionsPerDay × daysPerWeek and counts what was delivered", () => {
    // worked example (our own arithmetic): 1 session × 5 days = 5 sessions; 5 × 30 min = 150 minutes.
    expect(result.sessions.prescribed).toBe(5);
    expect(result.minutes.prescribed).toBe(150);
    // worked example (our own arithmetic): 4 check-ins of 30 min = 4 sessions, 120 minutes.
    expect(result.sessions.delivered).toBe(4);
    expect(result.minutes.delivered).toBe(120);
  });

  it("gives 80 % both ways", () => {
    // worked example (our own arithmetic): 4 / 5 = 0.8 and 120 / 150 = 0.8. (80 % is the usual cut-off, which
    // REFERENCES gives from memory, unverified; only the arithmetic is checked here.)
    expect(result.sessions.ratio).toBeCloseTo(0.8, 12);
    expect(result.minutes.ratio).toBeCloseTo(0.8, 12);
    expect(percentForDisplay(result.sessions)).toBe(80);
    expect(percentForDisplay(result.minutes)).toBe(80);
    expect(isUnderHalf(result)).toBe(false);
  });

  it("keeps sessions and minutes apart when sessions run short", () => {
    // worked example (our own arithmetic): 5 sessions of 15 min: 5 / 5 = 100 % of sessions, 75 / 150 = 50 % of minutes.
    const short = adherenceOver(input([v1], logged(15, MON, "2026-11-03", "2026-11-04", THU, "2026-11-06")), week);
    expect(short.sessions.ratio).toBeCloseTo(1, 12);
    expect(short.minutes.ratio).toBeCloseTo(0.5, 12);
  });
});

describe("a version change part-way through a week", () => {
  // Monday and Wednesday under v1 (30 min); Thursday twice, Friday and Saturday under v2 (20 min).
  const checkIns = [...logged(30, MON, "2026-11-04"), ...logged(20, THU, THU, "2026-11-06", "2026-11-07")];
  const result = adherenceOver(input([v1, v2], checkIns), week);

  it("measures each day against the version in force that day", () => {
    // worked example (our own arithmetic): v1 Mon–Wed, 3 days × 1·5/7; v2 from Thursday, 4 days × 2·5/7:
    // sessions = 15/7 + 40/7 = 55/7 ≈ 7.857; minutes = 3·150/7 + 4·200/7 = 450/7 + 800/7 = 1250/7 ≈ 178.57.
    expect(result.sessions.prescribed).toBeCloseTo(55 / 7, 12);
    expect(result.minutes.prescribed).toBeCloseTo(1250 / 7, 12);
    expect(result.versionNumbers).toEqual([1, 2]);
  });

  it("sets what was delivered against it", () => {
    // worked example (our own arithmetic): 6 sessions, 2·30 + 4·20 = 140 minutes;
    // 6 ÷ 55/7 = 42/55 ≈ 76.4 %; 140 ÷ 1250/7 = 980/1250 = 78.4 %.
    expect(result.sessions.delivered).toBe(6);
    expect(result.minutes.delivered).toBe(140);
    expect(result.sessions.ratio).toBeCloseTo(42 / 55, 12);
    expect(result.minutes.ratio).toBeCloseTo(0.784, 12);
    // worked example (our own arithmetic): 76.36… and 78.4 shown rounded down: 76 and 78.
    expect([percentForDisplay(result.sessions), percentForDisplay(result.minutes)]).toEqual([76, 78]);
  });
});

describe("the programme to date over several weeks and two versions", () => {
  // v1 on 2–4 November, v2 from 5 November; today Sunday 22 November. Two check-ins of 30 min under v1, then
  // eighteen of 20 min under v2 (one a day, 5–22 November).
  const v2Days = Array.from({ length: 18 }, (_, i) => `2026-11-${String(5 + i).padStart(2, "0")}`);
  const data = input([v2, v1], [...logged(30, MON, "2026-11-03"), ...logged(20, ...v2Days)]);
  const total = programmeToDate(data, "2026-11-22")!;

  it("adds each version's days", () => {
    // worked example (our own arithmetic): v1 3 days, v2 18 days. Sessions = 3·5/7 + 18·10/7 = 15/7 + 180/7 =
    // 195/7 ≈ 27.86; minutes = 3·150/7 + 18·200/7 = 450/7 + 3600/7 = 4050/7 ≈ 578.57.
    expect(total).toMatchObject({ from: MON, to: "2026-11-22", prescribedDays: 21, versionNumbers: [1, 2] });
    expect(total.sessions.prescribed).toBeCloseTo(195 / 7, 12);
    expect(total.minutes.prescribed).toBeCloseTo(4050 / 7, 12);
  });

  it("gives the ratios over the whole programme", () => {
    // worked example (our own arithmetic): 20 sessions, 2·30 + 18·20 = 420 min; 20 ÷ 195/7 = 140/195 = 28/39 ≈
    // 71.8 %; 420 ÷ 4050/7 = 2940/4050 = 98/135 ≈ 72.6 %.
    expect(total.sessions.delivered).toBe(20);
    expect(total.minutes.delivered).toBe(420);
    expect(total.sessions.ratio).toBeCloseTo(28 / 39, 12);
    expect(total.minutes.ratio).toBeCloseTo(98 / 135, 12);
  });

  it("equals the sum of its calendar weeks", () => {
    // worked example (our own arithmetic): weeks of 2, 9 and 16 November: 55/7 + 10 + 10 = 195/7 sessions.
    const weeks = adherenceByWeek(data, "2026-11-22");
    expect(weeks.map((w) => w.weekOf)).toEqual([MON, "2026-11-09", "2026-11-16"]);
    expect(weeks.map((w) => w.sessions.prescribed)).toEqual([expect.closeTo(55 / 7, 12), 10, 10]);
    expect(weeks.reduce((sum, w) => sum + w.minutes.delivered, 0)).toBe(420);
  });
});
