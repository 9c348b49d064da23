import { z } from "zod";
import { YES_NO } from "./questions";

// Building blocks for the screening schema. Radio groups send "yes"/"no" (not booleans) so an unanswered question
// (null or missing) is told apart from an answered "no", and stored answers read the same way they were asked.

export const yesNo = (message: string) => z.enum(YES_NO, { error: message });

export const choice = <const T extends readonly [string, ...string[]]>(values: T, message: string) =>
  z.enum(values, { error: message });

export const requiredText = (missing: string, max: number, tooLong = `Keep this under ${max} characters.`) =>
  z.string({ error: missing }).trim().min(2, missing).max(max, tooLong);

// Free text that may be left empty; an empty box is stored as nothing at all.
export const optionalText = (max: number, tooLong = `Keep this under ${max} characters.`) =>
  z
    .string({ error: "Enter text here, or leave it empty." })
    .trim()
    .max(max, tooLong)
    .optional()
    .transform((value) => (value ? value : undefined));

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

export function isIsoDate(value: string): boolean {
  if (!ISO_DATE.test(value)) return false;
  const date = new Date(`${value}T00:00:00Z`);
  return !Number.isNaN(date.getTime()) && date.toISOString().slice(0, 10) === value;
}

// The calendar date where the code runs. Browser and server may disagree for an hour or so around midnight; the
// checks that use it are about "not in the future" and "not in the past", where a day's grace does no harm.
export function todayIso(now = new Date()): string {
  const local = new Date(now.getTime() - now.getTimezoneOffset() * 60_000);
  return local.toISOString().slice(0, 10);
}

// A date box (<input type="date"> sends "" when empty): a real YYYY-MM-DD date, or nothing.
export const optionalDate = (message: string) =>
  z
    .string({ error: message })
    .trim()
    .optional()
    .refine((value) => !value || isIsoDate(value), message)
    .transform((value) => (value ? value : undefined));
