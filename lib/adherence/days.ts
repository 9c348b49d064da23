// Calendar days as "yyyy-mm-dd" strings. The caller passes days already in the clinic's own calendar
// (Europe/London); here they are counted as whole days from 1970-01-01 in UTC, so no time zone or clock change can
// move a day or make one 23 or 25 hours long.
const DAY_MS = 24 * 60 * 60 * 1000;
const ISO_DAY = /^(\d{4})-(\d{2})-(\d{2})$/;

export type IsoDay = string;

export class AdherenceInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "AdherenceInputError";
  }
}

/** Whole days since 1970-01-01. Throws on anything that is not a real calendar day (2026-02-30 included). */
export function dayNumber(day: IsoDay, what = "A day"): number {
  const match = ISO_DAY.exec(day);
  if (match) {
    const ms = Date.UTC(Number(match[1]), Number(match[2]) - 1, Number(match[3]));
    // Date.UTC rolls 30 February over into March, so only the round trip proves the day exists.
    if (new Date(ms).toISOString().slice(0, 10) === day) return ms / DAY_MS;
  }
  throw new AdherenceInputError(`${what} must be a real calendar day written yyyy-mm-dd, not "${day}".`);
}

export function assertDay(day: IsoDay, what: string): void {
  dayNumber(day, what);
}

export function dayFromNumber(n: number): IsoDay {
  return new Date(n * DAY_MS).toISOString().slice(0, 10);
}

export function addDays(day: IsoDay, days: number): IsoDay {
  return dayFromNumber(dayNumber(day) + days);
}

/** Every day from `first` to `last`, both included. */
export function eachDay(first: IsoDay, last: IsoDay): IsoDay[] {
  const days: IsoDay[] = [];
  for (let n = dayNumber(first), end = dayNumber(last); n <= end; n += 1) days.push(dayFromNumber(n));
  return days;
}

/** @deprecated The earlier name of `eachDay`. */
export const daysBetween = eachDay;

/** The Monday of the Monday-to-Sunday week a day falls in (weeks are named by their Monday). */
export function mondayOf(day: IsoDay): IsoDay {
  const n = dayNumber(day);
  // 1970-01-01 was a Thursday, three days after a Monday.
  const sinceMonday = (((n + 3) % 7) + 7) % 7;
  return dayFromNumber(n - sinceMonday);
}
