import { describe, expect, it } from "vitest";
import { axisTicks, niceStep } from "@/components/stim-picture/axis-ticks";
import { cycleSegments, envelopeLevel, partAt, ribbonPoints, timeToX } from "@/components/stim-picture/cycle-geometry";

// Demo cycle (invented): ramps 1 s and 2 s, hold 5 s, rest 12 s, so a cycle is 20 s.
const times = { rampUpS: 1, holdS: 5, rampDownS: 2, restS: 12 };
const plot = { x0: 20, x1: 420 };
const band = { baseY: 100, restThickness: 8, fullHeight: 60 };

describe("cycle ribbon geometry", () => {
  it("gives each part a width proportional to its duration, over two whole cycles", () => {
    const segments = cycleSegments(times, 2, plot);
    expect(segments.map((s) => s.part)).toEqual(["ramp-up", "hold", "ramp-down", "rest", "ramp-up", "hold", "ramp-down", "rest"]);
    const pxPerSecond = (plot.x1 - plot.x0) / 40;
    for (const s of segments) expect(s.x1 - s.x0).toBeCloseTo((s.endS - s.startS) * pxPerSecond, 9);
    expect(segments[0]?.x0).toBe(plot.x0);
    expect(segments.at(-1)?.x1).toBeCloseTo(plot.x1, 9);
    // Contiguous: each part starts where the last one ended.
    for (let i = 1; i < segments.length; i += 1) expect(segments[i]?.x0).toBeCloseTo(segments[i - 1]!.x1, 9);
  });

  it("leaves out parts of zero length and does not divide by zero for an empty cycle", () => {
    expect(cycleSegments({ ...times, rampUpS: 0, restS: 0 }, 1, plot).map((s) => s.part)).toEqual(["hold", "ramp-down"]);
    expect(cycleSegments({ rampUpS: 0, holdS: 0, rampDownS: 0, restS: 0 }, 2, plot)).toEqual([]);
    expect(timeToX(5, 0, plot)).toBe(plot.x0);
    expect(ribbonPoints({ rampUpS: 0, holdS: 0, rampDownS: 0, restS: 0 }, 2, plot, band)).toEqual([]);
  });

  it("ramps linearly between off and the set amplitude", () => {
    expect(envelopeLevel(times, 0)).toBe(0);
    expect(envelopeLevel(times, 0.5)).toBeCloseTo(0.5, 12);
    expect(envelopeLevel(times, 3)).toBe(1);
    expect(envelopeLevel(times, 6.5)).toBeCloseTo(0.75, 12);
    expect(envelopeLevel(times, 15)).toBe(0);
    // The second cycle repeats the first.
    expect(envelopeLevel(times, 20.5)).toBeCloseTo(0.5, 12);
  });

  it("draws the ribbon's top at full height during the hold and at its rest thickness during the rest", () => {
    const points = ribbonPoints(times, 2, plot, band);
    const fullY = band.baseY - band.restThickness - band.fullHeight;
    const restY = band.baseY - band.restThickness;
    const holdStart = timeToX(1, 40, plot);
    const holdEnd = timeToX(6, 40, plot);
    expect(points).toContainEqual([holdStart, fullY]);
    expect(points).toContainEqual([holdEnd, fullY]);
    expect(points).toContainEqual([timeToX(8, 40, plot), restY]);
    // Closed along the baseline.
    expect(points.slice(-2)).toEqual([[plot.x1, band.baseY], [plot.x0, band.baseY]]);
  });

  it("steps straight up when there is no ramp-up, rather than sloping from the rest before it", () => {
    const points = ribbonPoints({ ...times, rampUpS: 0 }, 2, plot, band);
    const secondStart = timeToX(19, 38, plot);
    const atStart = points.filter(([x]) => Math.abs(x - secondStart) < 1e-9).map(([, y]) => y);
    expect(atStart).toContain(band.baseY - band.restThickness);
    expect(atStart).toContain(band.baseY - band.restThickness - band.fullHeight);
  });

  it("fills only up to the progress time, cutting a ramp at its level then", () => {
    const points = ribbonPoints(times, 2, plot, band, 6.5);
    const progressX = timeToX(6.5, 40, plot);
    for (const [x] of points) expect(x).toBeLessThanOrEqual(progressX + 1e-9);
    // Half-way down a 2 s ramp-down the level is 0.75.
    expect(points).toContainEqual([progressX, band.baseY - band.restThickness - 0.75 * band.fullHeight]);
    expect(ribbonPoints(times, 2, plot, band, 999)).toEqual(ribbonPoints(times, 2, plot, band));
  });

  it("names the part a moment falls in", () => {
    expect(partAt(times, 2, 0)).toEqual({ part: "ramp-up", cycle: 0 });
    expect(partAt(times, 2, 7.9)).toEqual({ part: "ramp-down", cycle: 0 });
    expect(partAt(times, 2, 21)).toEqual({ part: "hold", cycle: 1 });
    expect(partAt(times, 2, 40)).toBeNull();
  });
});

describe("time axis ticks", () => {
  it("uses steps of 1, 2 or 5 times a power of ten, no more than the tick budget", () => {
    for (const span of [0.7, 3, 14, 54, 99, 360, 7200]) {
      const step = niceStep(span);
      const mantissa = step / 10 ** Math.floor(Math.log10(step));
      expect([1, 2, 5]).toContain(Math.round(mantissa * 1e9) / 1e9);
      expect(span / step).toBeLessThanOrEqual(8);
    }
    expect(axisTicks(54)).toEqual([0, 10, 20, 30, 40, 50]);
    expect(axisTicks(0.3, 3)).toEqual([0, 0.1, 0.2, 0.3]);
    expect(axisTicks(0)).toEqual([0]);
  });
});
