import { describe, expect, it } from "vitest";
import { adherenceOver, AdherenceInputError, dayRange, lastDaysRange, programmeToDate } from "@/lib/adherence";
import { input, logged, MON, THU, v1, v2, version } from "./fixtures";

const week = { from: MON, to: "2026-11-08" };
const over = (...args: Parameters<typeof input>) => () => adherenceOver(input(...args), week);

describe("days that are not days", () => {
  it.each(["2026-02-30", "2026-13-01", "2026-11-2", "02/11/2026", "", "2026-11-02T10:00"])("refuses %j", (day) => {
    // common practice (no published source): a calendar day is written yyyy-mm-dd and must exist; 30 February
    // would otherwise roll over into March without a word.
    expect(over([v1], logged(30, day))).toThrow(AdherenceInputError);
    expect(over([v1], logged(30, day))).toThrow(/real calendar day written yyyy-mm-dd/);
    expect(over([{ ...v1, publishedOn: day }])).toThrow(/Version 1's publication day/);
  });

  it("accepts 29 February in a leap year only", () => {
    // worked example (our own arithmetic): 2028 is divisible by 4 (and not a century), 2027 is not.
    expect(() => dayRange("2028-02-29", "2028-02-29")).not.toThrow();
    expect(() => dayRange("2027-02-29", "2027-02-29")).toThrow(/2027-02-29/);
  });

  it("refuses a period that ends before it starts, and a window of no days", () => {
    // worked example (our own arithmetic): 8 November comes after 2 November; a window needs at least one day.
    expect(() => adherenceOver(input([v1]), { from: "2026-11-08", to: MON })).toThrow(/comes after the last/);
    expect(() => lastDaysRange(0, MON)).toThrow(/whole number of days from 1/);
    expect(() => lastDaysRange(1.5, MON)).toThrow(/whole number of days from 1/);
    expect(lastDaysRange(1, MON)).toEqual({ from: MON, to: MON });
    expect(() => programmeToDate(input([v1]), "today")).toThrow(/Today must be/);
  });
});

describe("minutes", () => {
  it.each([-5, Number.NaN, Number.POSITIVE_INFINITY])("refuses %d minutes", (minutes) => {
    // common practice (no published source): time spent cannot be negative or unknown.
    expect(over([v1], logged(minutes, THU))).toThrow(/minutes must be 0 or more/);
  });

  it("accepts 0 minutes as a session that was logged", () => {
    // worked example (our own arithmetic): 1 session of 0 min = 1/5 of sessions, 0/150 of minutes.
    const result = adherenceOver(input([v1], logged(0, THU)), week);
    expect([result.sessions.ratio, result.minutes.ratio]).toEqual([0.2, 0]);
  });
});

describe("versions", () => {
  it("may come in any order", () => {
    // worked example (our own arithmetic): the newest-first list gives the same 55/7 as the oldest-first one.
    expect(adherenceOver(input([v2, v1]), week)).toEqual(adherenceOver(input([v1, v2]), week));
    expect(adherenceOver(input([v2, v1]), week).sessions.prescribed).toBeCloseTo(55 / 7, 12);
  });

  it("may not be dated out of order with their numbers, nor share a number", () => {
    // common practice (no published source): version numbers are given in order of publication.
    expect(over([v1, { ...v2, publishedOn: "2026-11-01" }])).toThrow(/Version 2 \(2026-11-01\) is dated before version 1 \(2026-11-02\)/);
    expect(over([v1, { ...v2, number: 1 }])).toThrow(/Version 1 appears twice/);
    expect(over([{ ...v1, number: 0 }])).toThrow(/whole number from 1/);
  });

  it.each([
    [{ minutesPerSession: 0 }, /minutes per session must be more than 0/],
    [{ sessionsPerDay: 1.5 }, /sessions per day must be a whole number/],
    [{ daysPerWeek: 8 }, /days per week must be a whole number from 1 to 7/],
    [{ weeks: 0 }, /weeks must be a whole number from 1/],
  ])("refuses a schedule with %o", (schedule, message) => {
    // common practice (no published source): a week has 7 days, and a prescription prescribes something.
    expect(over([version(1, MON, schedule)])).toThrow(message);
  });
});
