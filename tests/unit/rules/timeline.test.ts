import { describe, expect, it } from "vitest";
import { buildTimeline } from "@/lib/timeline/build-timeline";

const at = (minute: number) => new Date(Date.UTC(2026, 10, 20, 9, minute));

// Invented events in the order the story happened: a report, a flag, a reply, a new version, a confirmation.
describe("the client's timeline", () => {
  it("puts versions, check-ins, flags, messages and confirmations on one axis, newest first", () => {
    const entries = buildTimeline("c1", {
      checkIns: [{ id: "ci", createdAt: at(0), sessionDate: "2026-11-20", minutes: 30, comfort: 6, worstSkin: 3, loggedBy: "Arthur" }],
      flags: [{ id: "f", createdAt: at(1), title: "Skin", severity: "review", resolvedAt: at(5), resolutionNote: "Shorter pulses", checkInId: "ci" }],
      messages: [
        { id: "m", createdAt: at(2), kind: "message", authorName: "Priya", body: "I'll shorten the pulses." },
        { id: "s", createdAt: at(3), kind: "system", authorName: null, body: "Version 2 published" },
      ],
      versions: [{ id: "v2", number: 2, publishedAt: at(3), reason: "Redness", authorName: "Priya", promptedByType: "check-in", promptedById: "ci" }],
      confirmations: [{ at: at(4), name: "Arthur", versionNumber: 2 }],
    });
    expect(entries.map((e) => e.kind)).toEqual(["flag-resolved", "confirmation", "version", "message", "flag", "check-in"]);
    expect(entries.find((e) => e.kind === "version")!.detail).toBe("Redness (in reply to a session log)");
    expect(entries.find((e) => e.kind === "check-in")!.href).toBe("/clients/c1/check-ins/ci");
  });

  it("puts a flag after the log that raised it when both were written at the same moment", () => {
    const same = at(7);
    const entries = buildTimeline("c1", {
      checkIns: [{ id: "ci", createdAt: same, sessionDate: "2026-11-20", minutes: 30, comfort: 6, worstSkin: 3, loggedBy: "Arthur" }],
      flags: [{ id: "f", createdAt: same, title: "Skin", severity: "review", resolvedAt: null, resolutionNote: null, checkInId: "ci" }],
      messages: [],
      versions: [],
      confirmations: [],
    });
    expect(entries.map((e) => e.kind)).toEqual(["flag", "check-in"]);
  });
});
