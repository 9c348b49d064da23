import { describe, expect, it } from "vitest";
import { adherenceRows } from "@/lib/trends/adherence";
import { adherenceSummary } from "@/lib/trends/summaries";
import type { TrendVersion } from "@/lib/trends";
import { checkIn, version } from "./fixtures";

// v1: 1 session of 30 min, 5 days a week, from Monday 2 March; v2: 2 sessions of 20 min, 5 days a week, from
// Thursday 12 March. Today is Wednesday 18 March.
const v1 = version(1, "2026-03-02", [["ch-1", 30]]);
const v2: TrendVersion = { ...version(2, "2026-03-12", [["ch-1", 30]]), schedule: { minutesPerSession: 20, sessionsPerDay: 2, daysPerWeek: 5, weeks: 12 } };
const logged = (days: string[], minutes: number) => days.map((day) => checkIn(day, { "ch-1": 20 }, { minutes }));
const sessions = [
  ...logged(["2026-03-02", "2026-03-03", "2026-03-04", "2026-03-05", "2026-03-06", "2026-03-07"], 30),
  ...logged(["2026-03-10", "2026-03-12", "2026-03-12", "2026-03-14"], 20),
  ...logged(["2026-03-16", "2026-03-17", "2026-03-18"], 20),
];
const rows = adherenceRows([v2, v1], sessions, "2026-03-18");

describe("adherence per week", () => {
  it("gives one row per Monday-to-Sunday week, the current one cut off at today", () => {
    expect(rows.map((r) => [r.label, r.from, r.to])).toEqual([
      ["w/c 2 Mar", "2026-03-02", "2026-03-08"],
      ["w/c 9 Mar", "2026-03-09", "2026-03-15"],
      ["w/c 16 Mar", "2026-03-16", "2026-03-18"],
    ]);
  });

  it("keeps the raw percentage above 100 for the table while the bar stops at 100", () => {
    // worked example (our own arithmetic): 6 sessions of 30 min against 1 × 5 days × 30 min = 5 sessions, 150 min.
    const [first] = rows;
    expect(first).toMatchObject({ deliveredSessions: 6, deliveredMinutes: 180, sessionsPercent: 120, minutesPercent: 120, sessionsBar: 100, minutesBar: 100 });
    expect(first?.prescribedSessions).toBeCloseTo(5, 10);
    expect(first?.prescribedMinutes).toBeCloseTo(150, 10);
  });

  it("measures a week with a version change against each day's version, and lists both versions", () => {
    // worked example (our own arithmetic): Mon–Wed under v1 = 3 × 5/7 sessions, Thu–Sun under v2 = 4 × 10/7:
    // 55/7 sessions and 3 × 150/7 + 4 × 200/7 = 1250/7 minutes. 4 of 20 min: 28/55 = 50.9 %, 560/1250 = 44.8 %,
    // shown rounded down as lib/adherence does.
    const second = rows[1]!;
    expect(second.prescribedSessions).toBeCloseTo(55 / 7, 10);
    expect(second.prescribedMinutes).toBeCloseTo(1250 / 7, 10);
    expect([second.sessionsPercent, second.minutesPercent, second.sessionsBar, second.minutesBar!]).toEqual([50, 44, (28 / 55) * 100, 44.8]);
    expect(second.versionNumbers).toEqual([1, 2]);
    expect(rows[2]!.versionNumbers).toEqual([2]);
  });

  it("leaves out a version replaced on the day it was published: it was never in force", () => {
    const replaced = version(3, "2026-03-12", [["ch-1", 30]]);
    const [, second] = adherenceRows([v1, v2, replaced], sessions, "2026-03-18");
    expect(second?.versionNumbers).toEqual([1, 3]);
  });

  it("drops the weeks before the loaded sessions begin rather than showing them short", () => {
    expect(adherenceRows([v1, v2], sessions, "2026-03-18", "2026-03-09").map((r) => r.weekOf)).toEqual(["2026-03-09", "2026-03-16"]);
  });

  it("prescribes nothing once the programme's weeks are over, so a finished programme is not read as missed", () => {
    // v1 runs for 1 week from 2 March; the following week has no prescription.
    const short: TrendVersion = { ...v1, schedule: { ...v1.schedule, weeks: 1 } };
    const [, after] = adherenceRows([short], sessions, "2026-03-15");
    expect(after).toMatchObject({ prescribedSessions: 0, sessionsPercent: null, sessionsBar: null, versionNumbers: [] });
  });

  it("has nothing to show before the first version", () => {
    expect(adherenceRows([], sessions, "2026-03-18")).toEqual([]);
  });
});

describe("the adherence summary", () => {
  it("adds up the weeks shown", () => {
    // worked example (our own arithmetic): sessions 13 of 5 + 55/7 + 30/7 = 120/7 ≈ 17.1 (75.8 %, shown 75 %);
    // minutes 180 + 80 + 60 = 320 of 150 + 1250/7 + 600/7 = 2900/7 ≈ 414.3 (77.2 %, shown 77 %).
    expect(adherenceSummary(rows)).toBe("Over 3 weeks, 13 of 17.1 prescribed sessions (75%) and 320 of 414.3 prescribed minutes (77%) were done.");
  });

  it("says so when nothing was prescribed", () => {
    expect(adherenceSummary([])).toBe("Nothing has been prescribed yet.");
  });
});
