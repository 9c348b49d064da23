import { addDays, assertDay, daysBetween, mondayOf } from "./days";

// Adherence is what was delivered against what was prescribed, in sessions and in minutes, each day measured
// against the version in force that day.

export type VersionSchedule = {
  number: number;
  /** The clinic's calendar day on which the version was published; it is in force from that day. */
  publishedOn: string;
  schedule: { minutesPerSession: number; sessionsPerDay: number; daysPerWeek: number };
};
export type LoggedSession = { sessionDate: string; minutes: number };

export type Period = {
  from: string;
  to: string;
  prescribedSessions: number;
  prescribedMinutes: number;
  deliveredSessions: number;
  deliveredMinutes: number;
  /** delivered ÷ prescribed, uncapped; null when nothing was prescribed. */
  sessionsRatio: number | null;
  minutesRatio: number | null;
};

function checkInputs(versions: VersionSchedule[], sessions: LoggedSession[]): VersionSchedule[] {
  for (const version of versions) assertDay(version.publishedOn, `Version ${version.number}'s publication day`);
  for (const session of sessions) {
    assertDay(session.sessionDate, "A session's day");
    if (!Number.isFinite(session.minutes) || session.minutes < 0) throw new Error(`A session's minutes must be 0 or more, not ${session.minutes}.`);
  }
  return [...versions].sort((a, b) => (a.publishedOn === b.publishedOn ? a.number - b.number : a.publishedOn < b.publishedOn ? -1 : 1));
}

/** The version in force on a day: the latest published on or before it; none before the first. */
export function versionOn(day: string, sortedVersions: VersionSchedule[]): VersionSchedule | null {
  let found: VersionSchedule | null = null;
  for (const version of sortedVersions) if (version.publishedOn <= day) found = version;
  return found;
}

/**
 * A day's share of the week's prescription. "Days a week" does not say which days, so each day carries
 * daysPerWeek / 7 of the week; a whole week under one version prescribes exactly sessionsPerDay × daysPerWeek.
 */
export function prescribedOn(day: string, sortedVersions: VersionSchedule[]) {
  const version = versionOn(day, sortedVersions);
  if (!version) return { sessions: 0, minutes: 0 };
  const sessions = (version.schedule.sessionsPerDay * version.schedule.daysPerWeek) / 7;
  return { sessions, minutes: sessions * version.schedule.minutesPerSession };
}

export function adherenceFor(from: string, to: string, versions: VersionSchedule[], sessions: LoggedSession[]): Period {
  assertDay(from, "The first day");
  assertDay(to, "The last day");
  if (from > to) throw new Error(`The first day (${from}) comes after the last (${to}).`);
  const sorted = checkInputs(versions, sessions);
  let prescribedSessions = 0;
  let prescribedMinutes = 0;
  for (const day of daysBetween(from, to)) {
    const share = prescribedOn(day, sorted);
    prescribedSessions += share.sessions;
    prescribedMinutes += share.minutes;
  }
  const within = sessions.filter((session) => session.sessionDate >= from && session.sessionDate <= to);
  const deliveredSessions = within.length;
  const deliveredMinutes = within.reduce((sum, session) => sum + session.minutes, 0);
  return {
    from,
    to,
    prescribedSessions,
    prescribedMinutes,
    deliveredSessions,
    deliveredMinutes,
    sessionsRatio: prescribedSessions > 0 ? deliveredSessions / prescribedSessions : null,
    minutesRatio: prescribedMinutes > 0 ? deliveredMinutes / prescribedMinutes : null,
  };
}

/** Monday-to-Sunday weeks from the week of the first version to the week of `today`, cut off at `today`. */
export function weeklyAdherence(versions: VersionSchedule[], sessions: LoggedSession[], today: string): Period[] {
  const sorted = checkInputs(versions, sessions);
  if (sorted.length === 0) return [];
  const weeks: Period[] = [];
  for (let monday = mondayOf(sorted[0]!.publishedOn); monday <= today; monday = addDays(monday, 7)) {
    const sunday = addDays(monday, 6);
    weeks.push(adherenceFor(monday, sunday < today ? sunday : today, sorted, sessions));
  }
  return weeks;
}

/** From the first version's day to `today`. */
export function programmeAdherence(versions: VersionSchedule[], sessions: LoggedSession[], today: string): Period | null {
  const sorted = checkInputs(versions, sessions);
  if (sorted.length === 0 || sorted[0]!.publishedOn > today) return null;
  return adherenceFor(sorted[0]!.publishedOn, today, sorted, sessions);
}

/** The `days` days ending with `today`, as the rule on low adherence reads them. */
export function lastDays(days: number, today: string, versions: VersionSchedule[], sessions: LoggedSession[]): Period {
  return adherenceFor(addDays(today, -(days - 1)), today, versions, sessions);
}

/** For display: a ratio as a whole percentage, never above 100. */
export function cappedPercent(ratio: number | null): number | null {
  return ratio === null ? null : Math.min(100, Math.round(ratio * 100));
}

/** Under half of the prescription, in sessions or in minutes (common practice, no published source). */
export function isUnderHalf(period: Period): boolean {
  return (period.sessionsRatio !== null && period.sessionsRatio < 0.5) || (period.minutesRatio !== null && period.minutesRatio < 0.5);
}
