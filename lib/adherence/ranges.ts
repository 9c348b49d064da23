import { AdherenceInputError, addDays, dayNumber, mondayOf, type IsoDay } from "./days";

// The stretches of days adherence is read over. Every range includes both its first and its last day.
export type DayRange = { from: IsoDay; to: IsoDay };
export type CalendarWeek = DayRange & { weekOf: IsoDay; complete: boolean };

export function dayRange(from: IsoDay, to: IsoDay): DayRange {
  if (dayNumber(from, "The first day") > dayNumber(to, "The last day")) {
    throw new AdherenceInputError(`The first day (${from}) comes after the last (${to}).`);
  }
  return { from, to };
}

/** The `days` days ending with `today`, today included, so a session logged today counts in the window. */
export function lastDaysRange(days: number, today: IsoDay): DayRange {
  if (!Number.isInteger(days) || days < 1) throw new AdherenceInputError(`A rolling window must be a whole number of days from 1, not ${days}.`);
  return dayRange(addDays(today, -(days - 1)), today);
}

/**
 * Monday-to-Sunday weeks, named by their Monday, from the week `from` falls in to the week of `today`. A week
 * starts on its Monday even when `from` is mid-week (the days before simply prescribe nothing). The week of
 * `today` stops at `today` and is marked incomplete, so days still to come are not counted as missed.
 */
export function calendarWeeks(from: IsoDay, today: IsoDay): CalendarWeek[] {
  dayRange(from, today);
  const weeks: CalendarWeek[] = [];
  for (let monday = mondayOf(from); monday <= today; monday = addDays(monday, 7)) {
    const sunday = addDays(monday, 6);
    const complete = sunday <= today;
    weeks.push({ weekOf: monday, from: monday, to: complete ? sunday : today, complete });
  }
  return weeks;
}
