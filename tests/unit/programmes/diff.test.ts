import { describe, expect, it } from "vitest";
import { describeChange, diffProgrammes } from "@/lib/programmes/diff";
import { sampleContent } from "./fixtures";

describe("the readable diff between two versions", () => {
  it("is empty for identical versions", () => {
    expect(diffProgrammes(sampleContent(), sampleContent())).toEqual([]);
  });

  it("says a pulse-duration change the way a therapist would", () => {
    const before = sampleContent();
    const after = sampleContent();
    after.channels[0]!.settings.phaseDurationUs = 250;
    const changes = diffProgrammes(before, after);
    expect(changes).toHaveLength(1);
    expect(describeChange(changes[0]!)).toBe("Pulse duration, channel 1: 300 µs → 250 µs");
  });

  it("reports a larger electrode, a new channel, a schedule change and an added caution, and nothing else", () => {
    const before = sampleContent();
    const after = sampleContent();
    after.channels[0]!.settings.electrodes[0] = { shape: "rectangle", width: 5, length: 9, unit: "cm" };
    after.channels.push({ ...structuredClone(after.channels[0]!), id: "ch-2", target: "Wrist and finger flexors" });
    after.schedule.minutesPerSession = 40;
    after.ownCautions.push("Keep the arm supported on a pillow.");
    const lines = diffProgrammes(before, after).map(describeChange);
    expect(lines).toEqual([
      "Electrode A, channel 1: round, 2 in across → rectangle, 5 × 9 cm",
      "Channel 2 added: Wrist and finger flexors",
      "Minutes per session (schedule): 30 → 40",
      "Caution added (cautions): Keep the arm supported on a pillow.",
    ]);
  });

  it("reports a removed channel and a removed step", () => {
    const before = sampleContent();
    before.channels.push({ ...structuredClone(before.channels[0]!), id: "ch-2", target: "Triceps" });
    const after = sampleContent();
    after.electrodeCare = after.electrodeCare.slice(1);
    const lines = diffProgrammes(before, after).map(describeChange);
    expect(lines).toContain("Channel 2 removed: Triceps");
    expect(lines.some((line) => line.startsWith("Step removed (electrode care): Turn the stimulator off"))).toBe(true);
  });
});
