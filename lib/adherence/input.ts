import type { Schedule } from "@/lib/programmes/content";
import { AdherenceInputError, dayNumber, type IsoDay } from "./days";

// What adherence needs from a published version and from a check-in, checked once at the door. A published
// version's `schedule` can be passed as it is (its `reviewOn` is not read).
export type AdherenceSchedule = Pick<Schedule, "minutesPerSession" | "sessionsPerDay" | "daysPerWeek" | "weeks">;
export type PublishedVersion = { id: string; number: number; publishedOn: IsoDay; schedule: AdherenceSchedule };
export type CheckInRecord = { sessionDate: IsoDay; minutes: number };
export type AdherenceInput = { versions: readonly PublishedVersion[]; checkIns: readonly CheckInRecord[] };

/** Only the deprecated wrappers leave `weeks` out: their versions carry none, so their programme never ends. */
type LooseVersion = Omit<PublishedVersion, "schedule"> & { schedule: Omit<AdherenceSchedule, "weeks"> & { weeks?: number } };
export type CheckedVersion = LooseVersion & { publishedDay: number };
export type CheckedInput = { versions: CheckedVersion[]; checkIns: { day: number; minutes: number }[] };

const whole = (x: number, min: number, max = Infinity) => Number.isInteger(x) && x >= min && x <= max;

function scheduleProblem({ minutesPerSession, sessionsPerDay, daysPerWeek, weeks }: LooseVersion["schedule"]): string | null {
  if (!Number.isFinite(minutesPerSession) || minutesPerSession <= 0) return `minutes per session must be more than 0, not ${minutesPerSession}`;
  if (!whole(sessionsPerDay, 1)) return `sessions per day must be a whole number from 1, not ${sessionsPerDay}`;
  if (!whole(daysPerWeek, 1, 7)) return `days per week must be a whole number from 1 to 7, not ${daysPerWeek}`;
  if (weeks !== undefined && !whole(weeks, 1)) return `weeks must be a whole number from 1, not ${weeks}`;
  return null;
}

/**
 * Versions may come in any order (the queries list the newest first), so they are put in number order. Numbers
 * must be distinct, and a later number may not be dated before an earlier one: that would make "the version in
 * force" ambiguous, so it is refused rather than guessed at.
 */
export function checkInput(input: { versions: readonly LooseVersion[]; checkIns: readonly CheckInRecord[] }): CheckedInput {
  const versions = input.versions
    .map((version) => {
      if (!whole(version.number, 1)) throw new AdherenceInputError(`A version number must be a whole number from 1, not ${version.number}.`);
      const problem = scheduleProblem(version.schedule);
      if (problem) throw new AdherenceInputError(`Version ${version.number}: ${problem}.`);
      return { ...version, publishedDay: dayNumber(version.publishedOn, `Version ${version.number}'s publication day`) };
    })
    .sort((a, b) => a.number - b.number);
  versions.forEach((version, i) => {
    const before = versions[i - 1];
    if (before?.number === version.number) throw new AdherenceInputError(`Version ${version.number} appears twice.`);
    if (before && version.publishedDay < before.publishedDay) {
      throw new AdherenceInputError(`Version ${version.number} (${version.publishedOn}) is dated before version ${before.number} (${before.publishedOn}).`);
    }
  });
  const checkIns = input.checkIns.map((checkIn) => {
    const day = dayNumber(checkIn.sessionDate, "A check-in's session day");
    if (!Number.isFinite(checkIn.minutes) || checkIn.minutes < 0) {
      throw new AdherenceInputError(`A check-in's minutes must be 0 or more, not ${checkIn.minutes} (session day ${checkIn.sessionDate}).`);
    }
    return { day, minutes: checkIn.minutes };
  });
  return { versions, checkIns };
}
