import type { CheckedInput, CheckedVersion } from "./input";
import { prescribedFor, prescribingVersion } from "./prescription";
import type { DayRange } from "./ranges";

// The one place delivered is set against prescribed. Ranges reaching here are already checked.

export type Measure = {
  /** Unrounded: a part of a week prescribes a fraction of a session. */
  prescribed: number;
  delivered: number;
  /** delivered ÷ prescribed, uncapped (above 1 when more was done); null when nothing was prescribed. */
  ratio: number | null;
  /** ratio × 100, at most 100, unrounded (the display helper rounds); null with the ratio. */
  cappedPercent: number | null;
};

export type PeriodAdherence = DayRange & {
  sessions: Measure;
  minutes: Measure;
  /** Days of the range that carried a prescription. */
  prescribedDays: number;
  /** The versions that prescribed on those days, by number. */
  versionNumbers: number[];
  /** Check-ins dated on days with no prescription: counted in `delivered` too; this says how much of it. */
  onUnprescribedDays: { sessions: number; minutes: number };
};

function measure(prescribed: number, delivered: number): Measure {
  const ratio = prescribed > 0 ? delivered / prescribed : null;
  return { prescribed, delivered, ratio, cappedPercent: ratio === null ? null : Math.min(100, ratio * 100) };
}

const totalMinutes = (list: readonly { minutes: number }[]) => list.reduce((sum, c) => sum + c.minutes, 0);

export function measureRange(input: CheckedInput, range: DayRange, first: number, last: number): PeriodAdherence {
  const daysUnder = new Map<CheckedVersion, number>();
  for (let day = first; day <= last; day += 1) {
    const version = prescribingVersion(input.versions, day);
    if (version) daysUnder.set(version, (daysUnder.get(version) ?? 0) + 1);
  }
  let [sessions, minutes, prescribedDays] = [0, 0, 0];
  for (const [version, days] of daysUnder) {
    const share = prescribedFor(version, days);
    [sessions, minutes, prescribedDays] = [sessions + share.sessions, minutes + share.minutes, prescribedDays + days];
  }
  const within = input.checkIns.filter((c) => c.day >= first && c.day <= last);
  const unprescribed = within.filter((c) => !prescribingVersion(input.versions, c.day));
  return {
    from: range.from,
    to: range.to,
    sessions: measure(sessions, within.length),
    minutes: measure(minutes, totalMinutes(within)),
    prescribedDays,
    versionNumbers: [...daysUnder.keys()].map((v) => v.number),
    onUnprescribedDays: { sessions: unprescribed.length, minutes: totalMinutes(unprescribed) },
  };
}
