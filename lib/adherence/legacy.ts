import { dayNumber } from "./days";
import { checkInput, type CheckedInput, type CheckInRecord } from "./input";
import { measureRange, type PeriodAdherence } from "./measure";
import { prescribedFor, versionInForce } from "./prescription";
import { calendarWeeks, dayRange, lastDaysRange, type DayRange } from "./ranges";

// The first shape of this module, kept so that lib/rules/daily-rules.ts and lib/trends keep working while they move
// to the API in reports.ts. Every function here runs on the same computation. Its versions carry no `weeks`, so
// the programme never ends here: the end rule applies only through the new API.

/** @deprecated Use `PublishedVersion` (it carries `id` and `weeks`). */
export type VersionSchedule = { number: number; publishedOn: string; schedule: { minutesPerSession: number; sessionsPerDay: number; daysPerWeek: number } };
/** @deprecated Use `CheckInRecord`. */
export type LoggedSession = CheckInRecord;
/** @deprecated Use `PeriodAdherence`; the flat fields repeat its `sessions` and `minutes`. */
export type Period = PeriodAdherence & {
  prescribedSessions: number;
  prescribedMinutes: number;
  deliveredSessions: number;
  deliveredMinutes: number;
  sessionsRatio: number | null;
  minutesRatio: number | null;
};

function checked(versions: readonly VersionSchedule[], sessions: readonly LoggedSession[]): CheckedInput {
  // Only the three fields the old shape declared: a `weeks` passing through at run time must not end the programme.
  const loose = versions.map(({ number, publishedOn, schedule }) => ({
    id: `v${number}`,
    number,
    publishedOn,
    schedule: { minutesPerSession: schedule.minutesPerSession, sessionsPerDay: schedule.sessionsPerDay, daysPerWeek: schedule.daysPerWeek },
  }));
  return checkInput({ versions: loose, checkIns: sessions });
}

function flat(input: CheckedInput, range: DayRange): Period {
  const result = measureRange(input, range, dayNumber(range.from), dayNumber(range.to));
  return {
    ...result,
    prescribedSessions: result.sessions.prescribed,
    prescribedMinutes: result.minutes.prescribed,
    deliveredSessions: result.sessions.delivered,
    deliveredMinutes: result.minutes.delivered,
    sessionsRatio: result.sessions.ratio,
    minutesRatio: result.minutes.ratio,
  };
}

/** @deprecated Use `adherenceOver(input, dayRange(from, to))`. */
export function adherenceFor(from: string, to: string, versions: VersionSchedule[], sessions: LoggedSession[]): Period {
  return flat(checked(versions, sessions), dayRange(from, to));
}

/** @deprecated Use `adherenceByWeek(input, today)`. */
export function weeklyAdherence(versions: VersionSchedule[], sessions: LoggedSession[], today: string): Period[] {
  const input = checked(versions, sessions);
  const first = input.versions[0];
  if (!first || first.publishedDay > dayNumber(today, "Today")) return [];
  return calendarWeeks(first.publishedOn, today).map((week) => flat(input, week));
}

/** @deprecated Use `programmeToDate(input, today)`. */
export function programmeAdherence(versions: VersionSchedule[], sessions: LoggedSession[], today: string): Period | null {
  const input = checked(versions, sessions);
  const first = input.versions[0];
  if (!first || first.publishedDay > dayNumber(today, "Today")) return null;
  return flat(input, { from: first.publishedOn, to: today });
}

/** @deprecated Use `adherenceOverLastDays(input, days, today)`. */
export function lastDays(days: number, today: string, versions: VersionSchedule[], sessions: LoggedSession[]): Period {
  return flat(checked(versions, sessions), lastDaysRange(days, today));
}

/** @deprecated Use `prescriptionOn(input, day)`. */
export function versionOn(day: string, versions: VersionSchedule[]): VersionSchedule | null {
  const found = versionInForce(checked(versions, []).versions, dayNumber(day));
  return found ? (versions.find((v) => v.number === found.number) ?? null) : null;
}

/** @deprecated Use `prescriptionOn(input, day)`. */
export function prescribedOn(day: string, versions: VersionSchedule[]): { sessions: number; minutes: number } {
  const found = versionInForce(checked(versions, []).versions, dayNumber(day));
  return found ? prescribedFor(found, 1) : { sessions: 0, minutes: 0 };
}

/** @deprecated Rounds to the nearest whole number; use `Measure.cappedPercent` or `percentForDisplay`. */
export function cappedPercent(ratio: number | null): number | null {
  return ratio === null ? null : Math.min(100, Math.round(ratio * 100));
}
