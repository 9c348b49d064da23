import { describe, expect, it } from "vitest";
import { amplitudeChartData, amplitudeRows, ceilingSteps } from "@/lib/trends/amplitude";
import { channelsAcross } from "@/lib/trends/channels";
import { dayNumber } from "@/lib/trends/days";
import { placeCheckIns } from "@/lib/trends/timeline";
import { checkIn, version } from "./fixtures";

// v1 has channel ch-1 only; v2 adds ch-2; v3 drops ch-1 and lowers ch-2's ceiling.
const v1 = version(1, "2026-03-02", [["ch-1", 30]]);
const v2 = version(2, "2026-03-09", [["ch-1", 30], ["ch-2", 25]]);
const v3 = version(3, "2026-03-16", [["ch-2", 20]]);
const versions = [v3, v1, v2];
const sessions = [
  checkIn("2026-03-03", { "ch-1": 12 }, { versionNumber: 1 }),
  checkIn("2026-03-10", { "ch-1": 18, "ch-2": 15 }, { versionNumber: 2 }),
  checkIn("2026-03-17", { "ch-2": 22 }, { versionNumber: 3 }),
];

describe("the channels drawn", () => {
  it("lists the latest version's channels in order, then the ones dropped, saying which version last had them", () => {
    expect(channelsAcross(versions).map((c) => [c.id, c.label, c.key])).toEqual([
      ["ch-2", "Channel 1: Wrist extensors ch-2", "channel0"],
      ["ch-1", "Channel 1 (last in v2): Wrist extensors ch-1", "channel1"],
    ]);
  });
});

describe("amplitude per channel over time", () => {
  const channels = channelsAcross(versions);
  const rows = amplitudeRows(placeCheckIns(sessions), channels, versions);

  it("leaves a gap where a session's version did not have the channel", () => {
    // channel0 is ch-2, channel1 is ch-1.
    expect(amplitudeChartData(rows, channels).map(({ channel0, channel1 }) => [channel0, channel1])).toEqual([
      [null, 12],
      [15, 18],
      [22, null],
    ]);
    expect(amplitudeChartData(rows, channels).map((point) => point.channel0Above)).toEqual([false, false, true]);
  });

  it("compares each reading with the ceiling of the session's own version and says when it went above", () => {
    const last = rows[2]!;
    expect(last.readings[0]).toEqual({ amplitudeMa: 22, ceilingMa: 20, aboveCeiling: true });
    expect(rows[1]!.readings[0]).toEqual({ amplitudeMa: 15, ceilingMa: 25, aboveCeiling: false });
  });

  it("uses the older version's ceiling when the client logged against it after a newer one came out", () => {
    const late = checkIn("2026-03-18", { "ch-2": 22 }, { versionNumber: 2 });
    const [row] = amplitudeRows(placeCheckIns([late]), channels, versions);
    expect(row?.readings[0]).toEqual({ amplitudeMa: 22, ceilingMa: 25, aboveCeiling: false });
  });

  it("falls back to the version in force that day when the session's version is unknown", () => {
    const orphan = checkIn("2026-03-11", { "ch-2": 26 }, { versionNumber: null });
    const [row] = amplitudeRows(placeCheckIns([orphan]), channels, versions);
    expect(row?.readings[0]).toEqual({ amplitudeMa: 26, ceilingMa: 25, aboveCeiling: true });
  });

  it("does not count a reading exactly at the ceiling as above it", () => {
    const atCeiling = checkIn("2026-03-04", { "ch-1": 30 }, { versionNumber: 1 });
    const [row] = amplitudeRows(placeCheckIns([atCeiling]), channels, versions);
    expect(row?.readings[1]?.aboveCeiling).toBe(false);
  });
});

describe("the ceiling steps", () => {
  const [ch2, ch1] = channelsAcross(versions);
  const end = dayNumber("2026-03-20");

  it("run from each version's day to the next, and stop where the version in force has no such channel", () => {
    expect(ceilingSteps(ch1!, versions, end)).toEqual([{ fromX: dayNumber("2026-03-02"), toX: dayNumber("2026-03-16"), ceilingMa: 30, versionNumbers: [1, 2] }]);
    expect(ceilingSteps(ch2!, versions, end)).toEqual([
      { fromX: dayNumber("2026-03-09"), toX: dayNumber("2026-03-16"), ceilingMa: 25, versionNumbers: [2] },
      { fromX: dayNumber("2026-03-16"), toX: end, ceilingMa: 20, versionNumbers: [3] },
    ]);
  });

  it("skip a version replaced on the day it was published", () => {
    const sameDay = [version(1, "2026-03-02", [["ch-1", 30]]), version(2, "2026-03-02", [["ch-1", 24]])];
    const [channel] = channelsAcross(sameDay);
    expect(ceilingSteps(channel!, sameDay, dayNumber("2026-03-05"))).toEqual([
      { fromX: dayNumber("2026-03-02"), toX: dayNumber("2026-03-05"), ceilingMa: 24, versionNumbers: [2] },
    ]);
  });
});
