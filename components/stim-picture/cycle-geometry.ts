// Pure geometry of the cycle ribbon: seconds in, SVG coordinates out. Kept apart from the component so it can be
// tested on its own and reused by the handout and the session timer.

export type CycleTimes = { rampUpS: number; holdS: number; rampDownS: number; restS: number };
export type CyclePart = "ramp-up" | "hold" | "ramp-down" | "rest";

export const CYCLE_PARTS: readonly CyclePart[] = ["ramp-up", "hold", "ramp-down", "rest"];

export interface CycleSegment {
  part: CyclePart;
  /** 0-based cycle number. */
  cycle: number;
  startS: number;
  endS: number;
  x0: number;
  x1: number;
}

/** Horizontal extent of the plot in SVG units. */
export type PlotX = { x0: number; x1: number };

export function partDurationS(times: CycleTimes, part: CyclePart): number {
  switch (part) {
    case "ramp-up":
      return times.rampUpS;
    case "hold":
      return times.holdS;
    case "ramp-down":
      return times.rampDownS;
    case "rest":
      return times.restS;
  }
}

export const cycleSeconds = (t: CycleTimes): number => t.rampUpS + t.holdS + t.rampDownS + t.restS;

/** Maps seconds to x, to scale; an empty span maps everything to the left edge rather than dividing by zero. */
export function timeToX(seconds: number, totalS: number, plot: PlotX): number {
  if (!(totalS > 0)) return plot.x0;
  const clamped = Math.min(Math.max(seconds, 0), totalS);
  return plot.x0 + (clamped / totalS) * (plot.x1 - plot.x0);
}

/** The parts of `cycles` consecutive cycles, in time order, leaving out parts of zero length. */
export function cycleSegments(times: CycleTimes, cycles: number, plot: PlotX): CycleSegment[] {
  const cycleS = cycleSeconds(times);
  const totalS = cycleS * cycles;
  const out: CycleSegment[] = [];
  for (let cycle = 0; cycle < cycles; cycle += 1) {
    let startS = cycle * cycleS;
    for (const part of CYCLE_PARTS) {
      const duration = partDurationS(times, part);
      if (duration <= 0) continue;
      const endS = startS + duration;
      out.push({ part, cycle, startS, endS, x0: timeToX(startS, totalS, plot), x1: timeToX(endS, totalS, plot) });
      startS = endS;
    }
  }
  return out;
}

/** Intensity from 0 (off) to 1 (the set amplitude) at `seconds` into a repeating cycle; ramps are linear. */
export function envelopeLevel(times: CycleTimes, seconds: number): number {
  const cycleS = cycleSeconds(times);
  if (!(cycleS > 0)) return 0;
  const t = ((seconds % cycleS) + cycleS) % cycleS;
  if (t < times.rampUpS) return t / times.rampUpS;
  if (t <= times.rampUpS + times.holdS) return 1;
  const down = t - times.rampUpS - times.holdS;
  if (down < times.rampDownS) return 1 - down / times.rampDownS;
  return 0;
}

/** Where the ribbon's band runs: its baseline, its thickness at rest, and the extra height at full intensity. */
export type RibbonBand = { baseY: number; restThickness: number; fullHeight: number };

const LEVELS: Record<CyclePart, [number, number]> = {
  "ramp-up": [0, 1],
  hold: [1, 1],
  "ramp-down": [1, 0],
  rest: [0, 0],
};

/**
 * The ribbon's outline from time 0 to `untilS`: a band of constant thickness along the baseline that swells by
 * the envelope's level. Returned as polygon points, bottom edge last, ready for an SVG `points` attribute.
 */
export function ribbonPoints(
  times: CycleTimes,
  cycles: number,
  plot: PlotX,
  band: RibbonBand,
  untilS = cycleSeconds(times) * cycles,
): Array<[number, number]> {
  const totalS = cycleSeconds(times) * cycles;
  if (!(totalS > 0)) return [];
  const end = Math.min(Math.max(untilS, 0), totalS);
  const point = (t: number, level: number): [number, number] => [
    timeToX(t, totalS, plot),
    band.baseY - band.restThickness - level * band.fullHeight,
  ];
  // Two points per part (its start and its end level) keep a part of zero length, such as no ramp-up, a
  // vertical step rather than a slope borrowed from its neighbour.
  const top: Array<[number, number]> = [];
  for (const s of cycleSegments(times, cycles, plot)) {
    if (s.startS >= end) break;
    const [from, to] = LEVELS[s.part];
    const stopS = Math.min(s.endS, end);
    top.push(point(s.startS, from), point(stopS, from + ((to - from) * (stopS - s.startS)) / (s.endS - s.startS)));
  }
  return [...top, [timeToX(end, totalS, plot), band.baseY], [plot.x0, band.baseY]];
}

/** Which part of which cycle `seconds` falls in (for the timer's words), or null outside the drawing. */
export function partAt(times: CycleTimes, cycles: number, seconds: number): { part: CyclePart; cycle: number } | null {
  const segment = cycleSegments(times, cycles, { x0: 0, x1: 1 }).find((s) => seconds >= s.startS && seconds < s.endS);
  return segment ? { part: segment.part, cycle: segment.cycle } : null;
}
