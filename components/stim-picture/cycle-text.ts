import { cycleSeconds, partAt, type CyclePart, type CycleTimes } from "./cycle-geometry";
import { formatFigure, formatRatio, withUnit } from "./format";

export const PART_NAMES: Record<CyclePart, string> = {
  "ramp-up": "Ramp-up",
  hold: "Hold",
  "ramp-down": "Ramp-down",
  rest: "Rest",
};

const seconds = (s: number) => withUnit(s, "s", { maxFractionDigits: 2 });

/** The words that stand in for the ribbon: the same facts the drawing shows, for screen readers and print. */
export function describeCycle(times: CycleTimes, cycles: number, progressSeconds?: number): string {
  const cycleS = cycleSeconds(times);
  if (!(cycleS > 0)) return "No cycle to draw: ramp-up, hold, ramp-down and rest are all zero.";
  const on = times.rampUpS + times.holdS + times.rampDownS;
  const parts =
    `ramp-up ${seconds(times.rampUpS)}, hold ${seconds(times.holdS)}, ramp-down ${seconds(times.rampDownS)}, ` +
    `rest ${seconds(times.restS)}`;
  const ratio = on > 0 ? ` On : rest ${formatRatio(times.restS / on)} counting the ramps.` : "";
  const sentences = [
    `${formatFigure(cycles)} ${cycles === 1 ? "cycle" : "cycles"} of ${seconds(cycleS)} each, ${seconds(cycleS * cycles)} in all.`,
    `Each cycle: ${parts}.`,
    `On ${seconds(on)} counting the ramps, ${seconds(times.holdS)} at the set amplitude.${ratio}`,
  ];
  if (progressSeconds !== undefined) sentences.push(describeProgress(times, cycles, progressSeconds));
  return sentences.join(" ");
}

export function describeProgress(times: CycleTimes, cycles: number, progressSeconds: number): string {
  const totalS = cycleSeconds(times) * cycles;
  const done = Math.min(Math.max(progressSeconds, 0), totalS);
  const where = partAt(times, cycles, done);
  const place = where ? `: ${PART_NAMES[where.part].toLowerCase()} of cycle ${where.cycle + 1}` : ": finished";
  return `Filled to ${seconds(done)} of ${seconds(totalS)}${place}.`;
}
