import { z } from "zod";

/**
 * Builders for numeric fields with British-English messages. Every message names the field and its unit so
 * that the route handler can return it as-is beside the field.
 */

type Bound = { label: string; unit: string };

function numberField({ label, unit }: Bound) {
  return z.number({
    error: (issue) =>
      issue.input === undefined
        ? `Enter the ${label} (${unit}).`
        : `The ${label} must be a number in ${unit}.`,
  });
}

const fmt = (n: number): string => n.toLocaleString("en-GB");

/** A value that must be greater than zero and at most `max`. */
export function positiveField(bound: Bound, max: number) {
  return numberField(bound)
    .gt(0, { error: `The ${bound.label} must be more than 0 ${bound.unit}.` })
    .lte(max, { error: `The ${bound.label} must be ${fmt(max)} ${bound.unit} or less.` });
}

/** A value that may be zero (a ramp, a rest, a gap) but not negative, and at most `max`. */
export function nonNegativeField(bound: Bound, max: number) {
  return numberField(bound)
    .gte(0, { error: `The ${bound.label} cannot be negative.` })
    .lte(max, { error: `The ${bound.label} must be ${fmt(max)} ${bound.unit} or less.` });
}

/** A whole number from `min` to `max`. */
export function countField(bound: Bound, min: number, max: number) {
  const range = `The ${bound.label} must be a whole number from ${fmt(min)} to ${fmt(max)}.`;
  return numberField(bound)
    .int({ error: range })
    .gte(min, { error: range })
    .lte(max, { error: range });
}
