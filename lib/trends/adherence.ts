import { adherenceByWeek } from "@/lib/adherence";
import { formatShortDay, wholePercent } from "./format";
import type { TrendCheckIn, TrendVersion } from "./types";

export type AdherenceRow = {
  /** The Monday the week is named by. */
  weekOf: string;
  from: string;
  /** The last day counted: the Sunday, or today in the current week. */
  to: string;
  /** False for the current week, counted only up to today. */
  complete: boolean;
  label: string;
  prescribedSessions: number;
  deliveredSessions: number;
  prescribedMinutes: number;
  deliveredMinutes: number;
  /** delivered ÷ prescribed as a whole percentage, uncapped (120 when more was done); null when nothing was prescribed. */
  sessionsPercent: number | null;
  minutesPercent: number | null;
  /** The bar heights: the same share, never above 100. */
  sessionsBar: number | null;
  minutesBar: number | null;
  /** The versions that prescribed on some day of the week. */
  versionNumbers: number[];
};

/**
 * One row per Monday-to-Sunday week from the first version's week to today, from lib/adherence (each day against
 * the version in force that day; nothing prescribed after the programme's weeks). `completeFrom` is the first day
 * for which every session was loaded; weeks starting before it are left out rather than shown short.
 */
export function adherenceRows(versions: TrendVersion[], checkIns: TrendCheckIn[], today: string, completeFrom?: string): AdherenceRow[] {
  const input = {
    versions: versions.map(({ id, number, publishedOn, schedule }) => ({ id, number, publishedOn, schedule })),
    checkIns: checkIns.map((checkIn) => ({ sessionDate: checkIn.sessionDate, minutes: checkIn.minutes })),
  };
  return adherenceByWeek(input, today)
    .filter((week) => completeFrom === undefined || week.from >= completeFrom)
    .map((week) => ({
      weekOf: week.weekOf,
      from: week.from,
      to: week.to,
      complete: week.complete,
      label: `w/c ${formatShortDay(week.weekOf)}`,
      prescribedSessions: week.sessions.prescribed,
      deliveredSessions: week.sessions.delivered,
      prescribedMinutes: week.minutes.prescribed,
      deliveredMinutes: week.minutes.delivered,
      sessionsPercent: wholePercent(week.sessions.ratio),
      minutesPercent: wholePercent(week.minutes.ratio),
      sessionsBar: week.sessions.cappedPercent,
      minutesBar: week.minutes.cappedPercent,
      versionNumbers: [...week.versionNumbers].sort((a, b) => a - b),
    }));
}
