import { describe, expect, it } from "vitest";
import { buildTrends, loggedByText, toTrendCheckIn, toTrendVersion } from "@/lib/trends";
import { measureText, wholePercent } from "@/lib/trends/format";
import { dayNumber } from "@/lib/trends/days";
import type { CheckIn } from "@/db/schema";
import { checkIn, version } from "./fixtures";

const v1 = version(1, "2026-03-02", [["ch-1", 30], ["ch-2", 25]]);
const v2 = version(2, "2026-03-09", [["ch-1", 28], ["ch-2", 25]]);

describe("the trends of one client", () => {
  it("has nothing to draw before the first check-in", () => {
    expect(buildTrends({ versions: [v1], checkIns: [], today: "2026-03-05" })).toBeNull();
  });

  it("runs the time axis from the first version to today and marks every version", () => {
    const trends = buildTrends({ versions: [v1, v2], checkIns: [checkIn("2026-03-04", { "ch-1": 10, "ch-2": 8 })], today: "2026-03-12" })!;
    expect(trends.axis.domain).toEqual([dayNumber("2026-03-02"), dayNumber("2026-03-13")]);
    expect(trends.markers.map((m) => m.label)).toEqual(["v1", "v2"]);
    expect(trends.amplitude.ceilings[0]!.map((step) => step.ceilingMa)).toEqual([30, 28]);
  });

  it("sums each chart up in one sentence", () => {
    const sessions = [
      checkIn("2026-03-03", { "ch-1": 12, "ch-2": 10 }, { comfort: 5 }),
      checkIn("2026-03-05", { "ch-1": 18, "ch-2": 14 }, { comfort: 8 }),
      checkIn("2026-03-10", { "ch-1": 30, "ch-2": 15 }, { comfort: 6, versionNumber: 2, loggedBy: { name: "Ian Reid", role: "carer" } }),
    ];
    sessions[1]!.skin[1]!.level = 3;
    const trends = buildTrends({ versions: [v1, v2], checkIns: sessions, today: "2026-03-11" })!;
    expect(trends.amplitude.summary).toBe("Channel 1 went from 12\u00a0mA on 3 Mar to 30\u00a0mA on 10 Mar, 1 session above its ceiling; Channel 2 went from 10\u00a0mA on 3 Mar to 15\u00a0mA on 10 Mar.");
    expect(trends.sessions.comfortSummary).toBe(
      "Comfort ranged from 5 to 8 out of 10 over 3 sessions; the latest, on 10 Mar, was 6 out of 10 (0 is very uncomfortable, 10 completely comfortable).",
    );
    expect(trends.sessions.skinSummary).toBe("The worst was level 3, red for longer, or still there next time, on 5 Mar; 2 sessions of 3 had no change under any electrode.");
    expect(trends.sessions.rows[2]!.loggedBy).toEqual({ name: "Ian Reid", role: "carer" });
  });
});

describe("when adherence cannot be worked out", () => {
  it("keeps the other charts and says why", () => {
    // Version 2 dated before version 1: lib/adherence refuses to guess which was in force.
    const trends = buildTrends({ versions: [v2, { ...v1, publishedOn: "2026-03-12" }], checkIns: [checkIn("2026-03-13", { "ch-1": 10, "ch-2": 8 })], today: "2026-03-14" })!;
    expect(trends.adherence.rows).toEqual([]);
    expect(trends.adherence.summary).toMatch(/^Adherence cannot be worked out: Version 2 .* is dated before version 1/);
    expect(trends.sessions.rows).toHaveLength(1);
  });
});

describe("from the query rows", () => {
  it("takes a version's publication day in London and each channel's ceiling", () => {
    const content = { channels: [{ id: "ch-1", target: "Wrist extensors", settings: { amplitudeCeilingMa: 32 } }], schedule: { minutesPerSession: 20, sessionsPerDay: 2, daysPerWeek: 6, weeks: 6 } };
    // 23:30 UTC on 30 June is already 1 July in London (summer time).
    expect(toTrendVersion({ id: "pv-2", number: 2, publishedAt: new Date("2026-06-30T23:30:00Z"), content })).toEqual({
      id: "pv-2",
      number: 2,
      publishedOn: "2026-07-01",
      channels: [{ id: "ch-1", target: "Wrist extensors", ceilingMa: 32 }],
      schedule: { minutesPerSession: 20, sessionsPerDay: 2, daysPerWeek: 6, weeks: 6 },
    });
  });

  it("keeps who logged a check-in and in what role", () => {
    const row = {
      id: "c1",
      sessionDate: "2026-03-03",
      createdAt: new Date("2026-03-03T10:00:00Z"),
      minutes: 25,
      comfort: 7,
      loggedByRole: "carer",
      channels: [{ channelId: "ch-1", amplitudeMa: 14 }],
      skin: [{ channelId: "ch-1", electrode: "A", level: 2, spreads: false, itch: false, photoIds: [] }],
    } as unknown as CheckIn;
    const trend = toTrendCheckIn({ checkIn: row, loggedByName: "Ian Reid", versionNumber: 1 });
    expect(trend.loggedBy).toEqual({ name: "Ian Reid", role: "carer" });
    expect(trend.skin).toEqual([{ channelId: "ch-1", electrode: "A", level: 2 }]);
  });
});

describe("words and figures in the tables", () => {
  it("marks a carer's entry as the carer's", () => {
    expect(loggedByText({ name: "Ian Reid", role: "carer" })).toBe("Ian Reid (carer)");
    expect(loggedByText({ name: "Callum Reid", role: "client" })).toBe("Callum Reid");
  });

  it("rounds a share down, never up to a figure not reached, and does not cap it", () => {
    expect(wholePercent(0.796)).toBe(79);
    expect(wholePercent(0.29)).toBe(29);
    expect(wholePercent(1.4)).toBe(140);
    expect(wholePercent(null)).toBeNull();
  });

  it("gives a week's real figures, fractions of a prescription included", () => {
    expect(measureText(9, 55 / 7, wholePercent(9 / (55 / 7)))).toBe("9 of 7.9 prescribed (114%)");
    expect(measureText(2, 0, null)).toBe("2 done, nothing prescribed");
  });
});
