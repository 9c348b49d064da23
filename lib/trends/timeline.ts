import { dayNumber, dayOfNumber } from "./days";
import type { PlacedCheckIn, TrendCheckIn } from "./types";

// The time axis counts days. A session is known only by its day, so the sessions of one day are spread evenly
// inside it, in the order they were logged; a version's marker sits at the start of its day, before them.

export function sortCheckIns<T extends TrendCheckIn>(checkIns: T[]): T[] {
  return [...checkIns].sort((a, b) =>
    a.sessionDate === b.sessionDate ? a.loggedAt.getTime() - b.loggedAt.getTime() : a.sessionDate < b.sessionDate ? -1 : 1,
  );
}

export function placeCheckIns(checkIns: TrendCheckIn[]): PlacedCheckIn[] {
  const sorted = sortCheckIns(checkIns);
  const perDay = new Map<string, number>();
  for (const checkIn of sorted) perDay.set(checkIn.sessionDate, (perDay.get(checkIn.sessionDate) ?? 0) + 1);
  const seen = new Map<string, number>();
  return sorted.map((checkIn) => {
    const k = seen.get(checkIn.sessionDate) ?? 0;
    seen.set(checkIn.sessionDate, k + 1);
    return { ...checkIn, x: dayNumber(checkIn.sessionDate) + (k + 1) / (perDay.get(checkIn.sessionDate)! + 1) };
  });
}

/** From the start of the earliest day to the end of the latest one. */
export function timeDomain(days: string[]): [number, number] {
  if (days.length === 0) throw new Error("A time axis needs at least one day.");
  const numbers = days.map(dayNumber);
  return [Math.min(...numbers), Math.max(...numbers) + 1];
}

const STEPS = [1, 2, 7, 14, 28, 56, 91];
const MAX_TICKS = 8;

/**
 * Tick positions at the start of days: every day or every other day for a short span, otherwise every week or
 * several weeks, on Mondays, so the ticks line up with the weekly adherence.
 */
export function dayTicks([from, to]: [number, number]): number[] {
  const span = to - from;
  const step = STEPS.find((s) => span / s <= MAX_TICKS) ?? Math.ceil(span / MAX_TICKS / 7) * 7;
  let first = from;
  if (step >= 7) {
    const weekday = new Date(`${dayOfNumber(from)}T00:00:00Z`).getUTCDay();
    first = from + ((8 - weekday) % 7);
  }
  const ticks: number[] = [];
  for (let tick = first; tick <= to; tick += step) ticks.push(tick);
  return ticks;
}
