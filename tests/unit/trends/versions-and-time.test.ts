import { describe, expect, it } from "vitest";
import { dayNumber, dayOfNumber, londonDay } from "@/lib/trends/days";
import { formatDay, formatTick } from "@/lib/trends/format";
import { dayTicks, placeCheckIns, timeDomain } from "@/lib/trends/timeline";
import { versionMarkers } from "@/lib/trends/versions";
import { checkIn, version } from "./fixtures";

describe("version markers", () => {
  it("puts one labelled line at the start of each publication day, in time order", () => {
    const markers = versionMarkers([version(2, "2026-03-09", []), version(1, "2026-03-02", [])]);
    expect(markers.map((m) => [m.day, m.x, m.label])).toEqual([
      ["2026-03-02", dayNumber("2026-03-02"), "v1"],
      ["2026-03-09", dayNumber("2026-03-09"), "v2"],
    ]);
    expect(markers[1]?.description).toBe("Version 2 published Mon 9 Mar 2026");
  });

  it("shares one line between versions published on the same day", () => {
    const markers = versionMarkers([version(2, "2026-03-02", []), version(1, "2026-03-02", []), version(3, "2026-03-20", [])]);
    expect(markers.map((m) => m.label)).toEqual(["v1, v2", "v3"]);
    expect(markers[0]?.description).toBe("Versions 1 and 2 published Mon 2 Mar 2026");
  });
});

describe("the clinic's calendar day", () => {
  it("is the day in London, which in summer is an hour ahead of UTC", () => {
    // source: UK summer time runs from the last Sunday of March to the last Sunday of October (BST = UTC+1).
    expect(londonDay(new Date("2026-06-30T23:30:00Z"))).toBe("2026-07-01");
    expect(londonDay(new Date("2026-01-15T23:30:00Z"))).toBe("2026-01-15");
  });

  it("counts days without drifting across the clock change", () => {
    expect(dayNumber("2026-03-30") - dayNumber("2026-03-28")).toBe(2);
    expect(dayOfNumber(dayNumber("2026-03-29") + 0.75)).toBe("2026-03-29");
  });

  it("is written the British way", () => {
    expect(formatDay("2026-03-03")).toBe("Tue 3 Mar 2026");
    expect(formatTick(dayNumber("2026-03-03") + 0.5)).toBe("3 Mar");
  });
});

describe("the time axis", () => {
  it("spreads the sessions of one day evenly inside it, in the order they were logged", () => {
    const evening = checkIn("2026-03-03", { "ch-1": 10 }, { loggedAt: new Date("2026-03-03T19:00:00Z") });
    const morning = checkIn("2026-03-03", { "ch-1": 12 }, { loggedAt: new Date("2026-03-03T08:00:00Z") });
    const next = checkIn("2026-03-04", { "ch-1": 14 });
    const placed = placeCheckIns([next, evening, morning]);
    const start = dayNumber("2026-03-03");
    expect(placed.map((p) => [p.id, p.x])).toEqual([
      [morning.id, start + 1 / 3],
      [evening.id, start + 2 / 3],
      [next.id, start + 1 + 1 / 2],
    ]);
  });

  it("runs from the start of the first day to the end of the last", () => {
    expect(timeDomain(["2026-03-09", "2026-03-02", "2026-03-05"])).toEqual([dayNumber("2026-03-02"), dayNumber("2026-03-10")]);
  });

  it("ticks every day over a short span and on Mondays over a long one", () => {
    const from = dayNumber("2026-03-04");
    expect(dayTicks([from, from + 5])).toHaveLength(6);
    const weekly = dayTicks([from, dayNumber("2026-04-10")]);
    expect(weekly.map(dayOfNumber)).toEqual(["2026-03-09", "2026-03-16", "2026-03-23", "2026-03-30", "2026-04-06"]);
    expect(weekly.length).toBeLessThanOrEqual(8);
  });
});
