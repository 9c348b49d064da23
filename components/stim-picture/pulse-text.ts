import { formatFigure, withUnit } from "./format";
import type { PulseGeometry, PulseInput, PulsePart } from "./pulse-geometry";

export const us = (value: number) => withUnit(value, "µs");
export const ma = (value: number) => withUnit(value, "mA");
export const hz = (periodUs: number) => withUnit(1_000_000 / periodUs, "Hz", { maxFractionDigits: 2 });

export function partName(part: PulsePart): string {
  if (part.kind === "phase") return `Phase ${(part.phase ?? 0) + 1}`;
  return part.kind === "interphase-gap" ? "Interphase gap" : "To the next pulse";
}

export const BREAK_NOTE =
  "Not to scale: the pulse is drawn wider than it is, and the rest of the period is shortened behind a break in the time axis.";

/** The words that stand in for the pulse drawing. */
export function describePulse(input: PulseInput, geometry: PulseGeometry): string {
  const sentences = geometry.parts
    .filter((p) => p.kind !== "to-next-pulse")
    .map((p) => (p.kind === "phase" ? `${partName(p)}: ${ma(p.currentMa)} for ${us(p.durationUs)}.` : `${partName(p)}: ${us(p.durationUs)}.`));
  sentences.push(`Pulse width ${us(geometry.pulseWidthUs)}; period ${us(input.periodUs)} (${hz(input.periodUs)}).`);
  if (geometry.overlap) {
    sentences.push(
      `The pulse is ${geometry.pulseWidthUs > input.periodUs ? "longer than" : "as long as"} the period, so the next pulse would start before this one ends.`,
    );
  } else {
    sentences.push(`No current for ${us(input.periodUs - geometry.pulseWidthUs)} until the next pulse.`);
  }
  if (geometry.broken) sentences.push(BREAK_NOTE);
  return sentences.join(" ");
}

/** A part's label in the drawing: long where it fits, the bare duration where only that fits. */
export function durationLabels(part: PulsePart): { long: string; short: string } {
  const duration = us(part.durationUs);
  if (part.kind === "phase") return { long: `phase ${(part.phase ?? 0) + 1}: ${duration}`, short: duration };
  if (part.kind === "interphase-gap") return { long: `gap ${duration}`, short: duration };
  return { long: `next pulse in ${duration}`, short: duration };
}

export const amplitudeLabel = (currentMa: number) => `${formatFigure(currentMa)} mA`;
