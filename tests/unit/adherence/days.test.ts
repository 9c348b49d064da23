import { describe, expect, it } from "vitest";
import { addDays, dayNumber, eachDay, mondayOf } from "@/lib/adherence";

describe("calendar days", () => {
  it("names a week by its Monday", () => {
    // worked example (our own arithmetic): 2 November 2026 is a Monday, 8 November its Sunday; 1 January 2027 is a
    // Friday in the week of Monday 28 December 2026.
    expect(mondayOf("2026-11-02")).toBe("2026-11-02");
    expect(mondayOf("2026-11-08")).toBe("2026-11-02");
    expect(mondayOf("2026-11-09")).toBe("2026-11-09");
    expect(mondayOf("2027-01-01")).toBe("2026-12-28");
  });

  it("counts whole days across the clock changes", () => {
    // worked example (our own arithmetic): UK clocks change on Sunday 29 March and Sunday 25 October 2026 (a 23-
    // and a 25-hour day in London); each is still one calendar day.
    expect(addDays("2026-03-28", 1)).toBe("2026-03-29");
    expect(addDays("2026-03-28", 2)).toBe("2026-03-30");
    expect(addDays("2026-10-24", 2)).toBe("2026-10-26");
    expect(dayNumber("2026-10-26") - dayNumber("2026-10-24")).toBe(2);
  });

  it("knows leap years and month ends", () => {
    // worked example (our own arithmetic): 2028 has 29 February, 2027 does not; 30 November + 1 is 1 December.
    expect(addDays("2028-02-28", 1)).toBe("2028-02-29");
    expect(addDays("2027-02-28", 1)).toBe("2027-03-01");
    expect(addDays("2026-11-30", 1)).toBe("2026-12-01");
    expect(addDays("2026-11-02", -2)).toBe("2026-10-31");
  });

  it("lists every day of a range, both ends included", () => {
    // worked example (our own arithmetic): 30 December to 2 January is 4 days.
    expect(eachDay("2026-12-30", "2027-01-02")).toEqual(["2026-12-30", "2026-12-31", "2027-01-01", "2027-01-02"]);
    expect(eachDay("2026-11-02", "2026-11-01")).toEqual([]);
  });
});
