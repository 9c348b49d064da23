import { dayNumber, type IsoDay } from "./days";
import { checkInput, type AdherenceInput, type CheckedInput } from "./input";
import { measureRange, type PeriodAdherence } from "./measure";
import { calendarWeeks, dayRange, lastDaysRange, type CalendarWeek, type DayRange } from "./ranges";

// Adherence over the periods the screens and the flag rules read. Each function checks its input once.

export type WeekAdherence = PeriodAdherence & Pick<CalendarWeek, "weekOf" | "complete">;

function over(input: CheckedInput, range: DayRange): PeriodAdherence {
  return measureRange(input, range, dayNumber(range.from), dayNumber(range.to));
}

/** Any range of days, both ends included. */
export function adherenceOver(input: AdherenceInput, range: DayRange): PeriodAdherence {
  return over(checkInput(input), dayRange(range.from, range.to));
}

/** The `days` days ending with `today`; the low-adherence rule reads 7. */
export function adherenceOverLastDays(input: AdherenceInput, days: number, today: IsoDay): PeriodAdherence {
  return over(checkInput(input), lastDaysRange(days, today));
}

function firstDay(checked: CheckedInput, today: IsoDay): IsoDay | null {
  dayNumber(today, "Today");
  const first = checked.versions[0];
  return first && first.publishedOn <= today ? first.publishedOn : null;
}

/** Each calendar week from the week of the first version to the week of `today` (cut off at `today`). */
export function adherenceByWeek(input: AdherenceInput, today: IsoDay): WeekAdherence[] {
  const checked = checkInput(input);
  const from = firstDay(checked, today);
  if (from === null) return [];
  return calendarWeeks(from, today).map((week) => ({ ...over(checked, week), weekOf: week.weekOf, complete: week.complete }));
}

/** From the first version's day to `today`; null while there is no programme yet. */
export function programmeToDate(input: AdherenceInput, today: IsoDay): PeriodAdherence | null {
  const checked = checkInput(input);
  const from = firstDay(checked, today);
  return from === null ? null : over(checked, { from, to: today });
}
