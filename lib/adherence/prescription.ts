import { dayFromNumber, dayNumber, type IsoDay } from "./days";
import { checkInput, type AdherenceInput, type CheckedVersion } from "./input";

// Which version is in force on a day, and what that day prescribes.
//
// In force: the latest version published on or before the day, so the day a version is published counts under it
// (two published the same day: the higher number). Before the first version nothing is prescribed.
// End: the programme runs for `weeks` weeks from the FIRST version's day, `weeks` being the version in force's. A new
// version does not restart the clock; to lengthen the programme the therapist raises `weeks`, which the version diff
// shows. After the end nothing is prescribed, so a finished programme does not read as one being missed.

export function versionInForce(versions: readonly CheckedVersion[], day: number): CheckedVersion | null {
  let found: CheckedVersion | null = null;
  for (const version of versions) if (version.publishedDay <= day) found = version;
  return found;
}

/** The version in force if the programme is still running that day, else null. */
export function prescribingVersion(versions: readonly CheckedVersion[], day: number): CheckedVersion | null {
  const version = versionInForce(versions, day);
  const first = versions[0];
  if (!version || !first) return null;
  const { weeks } = version.schedule;
  return weeks === undefined || day < first.publishedDay + 7 * weeks ? version : null;
}

/**
 * "Days a week" does not say which days, so each day carries daysPerWeek / 7 of the week's prescription. The
 * numerator is a whole number and there is one division, so a whole week is exactly sessionsPerDay × daysPerWeek.
 */
export function prescribedFor(version: CheckedVersion, days: number): { sessions: number; minutes: number } {
  const { sessionsPerDay, daysPerWeek, minutesPerSession } = version.schedule;
  const sessionDays = days * sessionsPerDay * daysPerWeek;
  return { sessions: sessionDays / 7, minutes: (sessionDays * minutesPerSession) / 7 };
}

export type DayPrescription = { day: IsoDay; versionId: string; versionNumber: number; sessions: number; minutes: number };

/** One day's prescription; null before the first version and after the programme's end. */
export function prescriptionOn(input: Pick<AdherenceInput, "versions">, day: IsoDay): DayPrescription | null {
  const { versions } = checkInput({ versions: input.versions, checkIns: [] });
  const version = prescribingVersion(versions, dayNumber(day, "The day"));
  return version ? { day, versionId: version.id, versionNumber: version.number, ...prescribedFor(version, 1) } : null;
}

/** The programme's last day as the version in force on `today` sets it; null before the first version. */
export function programmeLastDay(input: Pick<AdherenceInput, "versions">, today: IsoDay): IsoDay | null {
  const { versions } = checkInput({ versions: input.versions, checkIns: [] });
  const version = versionInForce(versions, dayNumber(today, "Today"));
  const first = versions[0];
  if (!version || !first || version.schedule.weeks === undefined) return null;
  return dayFromNumber(first.publishedDay + 7 * version.schedule.weeks - 1);
}
