import { describe, expect, it } from "vitest";
import { packStatus } from "@/lib/electrode-packs/pack-status";

describe("when to open a new pack of electrodes", () => {
  const base = { openedOn: "2026-11-01", uses: 5, replaceAfterUses: 20, latestCondition: "fine" as const };

  it("waits until the therapist's number of uses is reached", () => {
    expect(packStatus(base).replaceNow).toBe(false);
    expect(packStatus({ ...base, uses: 19 }).replaceNow).toBe(false);
    expect(packStatus({ ...base, uses: 20 })).toMatchObject({ replaceNow: true, reason: "uses" });
  });

  it("says so at once when edges lift or the electrodes stop sticking, whatever the count", () => {
    // common practice (no published source): a lifting edge concentrates current and means the electrode is worn out.
    expect(packStatus({ ...base, latestCondition: "edges-lifting" })).toMatchObject({ replaceNow: true, reason: "edges-lifting" });
    expect(packStatus({ ...base, latestCondition: "poor-sticking" })).toMatchObject({ replaceNow: true, reason: "poor-sticking" });
  });

  it("asks for a pack to be recorded when none has been", () => {
    expect(packStatus({ openedOn: null, uses: 0, replaceAfterUses: 20, latestCondition: null })).toMatchObject({ replaceNow: false, reason: "no-pack" });
  });
});
