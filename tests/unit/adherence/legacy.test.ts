import { describe, expect, it } from "vitest";
import { adherenceFor, adherenceOver, cappedPercent, isUnderHalf, lastDays, programmeAdherence, weeklyAdherence, type VersionSchedule } from "@/lib/adherence";
import { input, logged, MON, THU, v1, v2 } from "./fixtures";

// The first shape of the module, still used by the daily rules and the trends; it runs on the same computation.
const old = [v1, v2].map(({ number, publishedOn, schedule }): VersionSchedule => ({ number, publishedOn, schedule }));
const checkIns = [...logged(30, MON), ...logged(20, THU, THU)];

describe("the deprecated functions", () => {
  it("give the same figures as the new ones, also in their flat fields", () => {
    // worked example (our own arithmetic): the part-changed week, 55/7 sessions and 1250/7 minutes; 3 delivered.
    const flat = adherenceFor(MON, "2026-11-08", old, checkIns);
    expect(flat.prescribedSessions).toBeCloseTo(55 / 7, 12);
    expect(flat.prescribedMinutes).toBeCloseTo(1250 / 7, 12);
    expect([flat.deliveredSessions, flat.deliveredMinutes]).toEqual([3, 70]);
    expect(flat.sessionsRatio).toBeCloseTo(21 / 55, 12);
    expect(flat.sessions).toEqual(adherenceOver(input([v1, v2], checkIns), { from: MON, to: "2026-11-08" }).sessions);
    // worked example (our own arithmetic): 21/55 ≈ 38 % of sessions is under half.
    expect(isUnderHalf(flat)).toBe(true);
  });

  it("never end the programme, as before, even if a schedule passes `weeks` through", () => {
    // worked example (our own arithmetic): 1 week from 2 November would end on the 8th; the old shape knows no
    // weeks, so 16–22 November still prescribe v2's 10 sessions.
    const passing = old.map((v) => ({ ...v, schedule: { ...v.schedule, weeks: 1 } }));
    expect(lastDays(7, "2026-11-22", passing, []).prescribedSessions).toBe(10);
    expect(weeklyAdherence(passing, [], "2026-11-22").map((w) => w.from)).toEqual([MON, "2026-11-09", "2026-11-16"]);
    expect(programmeAdherence(passing, [], "2026-11-01")).toBeNull();
  });

  it("round the capped percentage to the nearest whole number, as before", () => {
    // worked example (our own arithmetic): 0.786 → 78.6 → 79; 1.4 → 140 → 100.
    expect([cappedPercent(0.786), cappedPercent(1.4), cappedPercent(null)]).toEqual([79, 100, null]);
  });
});
