import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { addDays, adherenceByWeek, adherenceOver, eachDay, programmeToDate, type CheckInRecord, type PublishedVersion } from "@/lib/adherence";

// Invented programmes of one to three versions within the ranges the builder allows, published within 120 days
// of 1 November 2026, and check-ins scattered over the same stretch (some before the first version or after the end).
const START = "2026-11-01";
const day = (n: number) => addDays(START, n);
const TOL = 1e-9;
const close = (a: number, b: number) => Math.abs(a - b) <= TOL * Math.max(1, Math.abs(b));

const arbSchedule = fc.record({
  minutesPerSession: fc.integer({ min: 1, max: 240 }),
  sessionsPerDay: fc.integer({ min: 1, max: 6 }),
  daysPerWeek: fc.integer({ min: 1, max: 7 }),
  weeks: fc.integer({ min: 1, max: 52 }),
});
const arbVersions = fc
  .array(fc.tuple(fc.integer({ min: 0, max: 120 }), arbSchedule), { minLength: 1, maxLength: 3 })
  .map((list): PublishedVersion[] =>
    list
      .map(([offset]) => offset)
      .sort((a, b) => a - b)
      .map((offset, i) => ({ id: `ver-${i + 1}`, number: i + 1, publishedOn: day(offset), schedule: list[i]![1] })),
  );
const arbCheckIns = fc.array(
  fc.record({ sessionDate: fc.integer({ min: 0, max: 180 }).map(day), minutes: fc.integer({ min: 0, max: 240 }) }),
  { maxLength: 40 },
);
const arbRange = fc.tuple(fc.integer({ min: 0, max: 180 }), fc.integer({ min: 0, max: 60 })).map(([from, length]) => ({ from: day(from), to: day(from + length) }));

describe("laws that hold for any programme", () => {
  it("never reports negative deliveries, and never shows more than 100 %", () => {
    fc.assert(
      fc.property(arbVersions, arbCheckIns, arbRange, (versions, checkIns, range) => {
        const r = adherenceOver({ versions, checkIns }, range);
        // worked example (our own arithmetic): a count and a sum of minutes that are each 0 or more.
        expect(r.sessions.delivered).toBeGreaterThanOrEqual(0);
        expect(r.minutes.delivered).toBeGreaterThanOrEqual(0);
        expect(r.sessions.prescribed).toBeGreaterThanOrEqual(0);
        for (const m of [r.sessions, r.minutes]) if (m.cappedPercent !== null) expect(m.cappedPercent).toBeLessThanOrEqual(100);
      }),
    );
  });

  it("prescribes exactly sessionsPerDay × daysPerWeek over any 7 days under one version", () => {
    fc.assert(
      fc.property(arbSchedule, fc.integer({ min: 0, max: 200 }), (schedule, start) => {
        const version: PublishedVersion = { id: "ver-1", number: 1, publishedOn: START, schedule: { ...schedule, weeks: 52 } };
        const r = adherenceOver({ versions: [version], checkIns: [] }, { from: day(start), to: day(start + 6) });
        // worked example (our own arithmetic): 7 days × sessionsPerDay × daysPerWeek / 7, and × minutesPerSession.
        const sessions = schedule.sessionsPerDay * schedule.daysPerWeek;
        expect(close(r.sessions.prescribed, sessions)).toBe(true);
        expect(close(r.minutes.prescribed, sessions * schedule.minutesPerSession)).toBe(true);
      }),
    );
  });

  it("gives a period's totals as the sum of its days", () => {
    fc.assert(
      fc.property(arbVersions, arbCheckIns, arbRange, (versions, checkIns, range) => {
        const whole = adherenceOver({ versions, checkIns }, range);
        const parts = eachDay(range.from, range.to).map((d) => adherenceOver({ versions, checkIns }, { from: d, to: d }));
        const sum = (pick: (p: typeof whole) => number) => parts.reduce((total, p) => total + pick(p), 0);
        // worked example (our own arithmetic): prescribed and delivered are sums over days, so they add up.
        expect(close(whole.sessions.prescribed, sum((p) => p.sessions.prescribed))).toBe(true);
        expect(close(whole.minutes.prescribed, sum((p) => p.minutes.prescribed))).toBe(true);
        expect(whole.sessions.delivered).toBe(sum((p) => p.sessions.delivered));
        expect(whole.minutes.delivered).toBe(sum((p) => p.minutes.delivered));
      }),
    );
  });

  it("gives the programme to date as the sum of its calendar weeks", () => {
    fc.assert(
      fc.property(arbVersions, arbCheckIns, fc.integer({ min: 0, max: 180 }), (versions, checkIns, today) => {
        const total = programmeToDate({ versions, checkIns }, day(today));
        const weeks = adherenceByWeek({ versions, checkIns }, day(today));
        // worked example (our own arithmetic): the weeks start on or before the first version's day, which
        // prescribes nothing earlier, so their prescriptions add up to the programme's (both empty before it).
        const weekly = weeks.reduce((s, w) => s + w.minutes.prescribed, 0);
        expect(total === null ? weeks.length === 0 : close(total.minutes.prescribed, weekly)).toBe(true);
      }),
    );
  });

  it("never lowers adherence when a check-in is added", () => {
    const arbExtra: fc.Arbitrary<CheckInRecord> = fc.record({ sessionDate: fc.integer({ min: 0, max: 180 }).map(day), minutes: fc.integer({ min: 0, max: 240 }) });
    fc.assert(
      fc.property(arbVersions, arbCheckIns, arbRange, arbExtra, (versions, checkIns, range, extra) => {
        const before = adherenceOver({ versions, checkIns }, range);
        const after = adherenceOver({ versions, checkIns: [...checkIns, extra] }, range);
        // worked example (our own arithmetic): the prescription does not depend on check-ins, and the delivered
        // count and minutes can only grow, so each ratio stays or rises (and stays null with nothing prescribed).
        for (const key of ["sessions", "minutes"] as const) {
          expect(after[key].prescribed).toBe(before[key].prescribed);
          if (before[key].ratio === null) expect(after[key].ratio).toBeNull();
          else expect(after[key].ratio!).toBeGreaterThanOrEqual(before[key].ratio!);
        }
      }),
    );
  });
});
