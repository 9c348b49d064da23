import { describe, expect, it } from "vitest";
import { currentToY, DEFAULT_PULSE_LAYOUT, pulseGeometry } from "@/components/stim-picture/pulse-geometry";

const layout = DEFAULT_PULSE_LAYOUT;
const width = (p: { x0: number; x1: number } | undefined) => (p ? p.x1 - p.x0 : NaN);

describe("pulse geometry", () => {
  it("draws the phases and the gap in proportion to their durations", () => {
    // Demo asymmetric pulse (invented): 40 mA for 300 µs, a 100 µs gap, −10 mA for 1,200 µs.
    const g = pulseGeometry({ phases: [{ currentMa: 40, durationUs: 300 }, { currentMa: -10, durationUs: 1200 }], interphaseGapUs: 100, periodUs: 20_000 });
    expect(g.parts.map((p) => p.kind)).toEqual(["phase", "interphase-gap", "phase", "to-next-pulse"]);
    const [first, gap, second] = g.parts;
    expect(width(second) / width(first)).toBeCloseTo(1200 / 300, 9);
    expect(width(gap) / width(first)).toBeCloseTo(100 / 300, 9);
    expect(g.pulseWidthUs).toBe(1600);
    expect(second?.currentMa).toBe(-10);
  });

  it("keeps the rest of the period to scale when it is short enough", () => {
    // 1,000 Hz (period 1,000 µs) with two 300 µs phases: the rest is 400 µs.
    const g = pulseGeometry({ phases: [{ currentMa: 30, durationUs: 300 }, { currentMa: -30, durationUs: 300 }], interphaseGapUs: 0, periodUs: 1000 });
    expect(g.broken).toBe(false);
    expect(g.breakX).toBeNull();
    const rest = g.parts.find((p) => p.kind === "to-next-pulse");
    expect(rest?.durationUs).toBe(400);
    expect(width(rest) / (width(g.parts[0]) + width(g.parts[1]))).toBeCloseTo(400 / 600, 9);
    expect(g.periodX).toBe(layout.x1);
  });

  it("breaks the time axis when the period dwarfs the pulse, and says where", () => {
    // 35 Hz: a period of about 28,571 µs against a 600 µs pulse.
    const g = pulseGeometry({ phases: [{ currentMa: 40, durationUs: 300 }, { currentMa: -40, durationUs: 300 }], interphaseGapUs: 0, periodUs: 1e6 / 35 });
    expect(g.broken).toBe(true);
    const pulseEnd = g.parts[1]!.x1;
    expect(pulseEnd - layout.x0).toBeCloseTo((layout.x1 - layout.x0) * layout.pulseShare, 9);
    expect(width(g.parts[0])).toBeCloseTo(width(g.parts[1]), 9);
    expect(g.breakX).toBeGreaterThan(pulseEnd);
    expect(g.breakX).toBeLessThan(layout.x1);
  });

  it("marks the start of the next pulse inside this one when the pulses overlap", () => {
    // 2,000 Hz: the period is 500 µs, shorter than the 600 µs pulse.
    const g = pulseGeometry({ phases: [{ currentMa: 40, durationUs: 300 }, { currentMa: -40, durationUs: 300 }], interphaseGapUs: 0, periodUs: 500 });
    expect(g.overlap).toBe(true);
    expect(g.parts.some((p) => p.kind === "to-next-pulse")).toBe(false);
    expect((g.periodX - layout.x0) / (layout.x1 - layout.x0)).toBeCloseTo(500 / 600, 9);
    expect(g.parts.at(-1)?.x1).toBeCloseTo(layout.x1, 9);
  });

  it("has no second phase or gap for a monophasic pulse", () => {
    const g = pulseGeometry({ phases: [{ currentMa: 50, durationUs: 300 }], interphaseGapUs: 50, periodUs: 1e6 / 35 });
    expect(g.parts.map((p) => p.kind)).toEqual(["phase", "to-next-pulse"]);
  });

  it("scales the amplitude so the largest phase reaches the full height on its own side", () => {
    expect(currentToY(40, 40, 100, 60)).toBe(40);
    expect(currentToY(-10, 40, 100, 60)).toBe(115);
    expect(currentToY(0, 40, 100, 60)).toBe(100);
    expect(currentToY(5, 0, 100, 60)).toBe(100);
  });
});
