import type { ChannelSeries } from "./channels";
import { dayNumber } from "./days";
import { sortVersions, versionInForce } from "./versions";
import type { LoggedBy, PlacedCheckIn, TrendVersion } from "./types";

export type AmplitudeReading = { amplitudeMa: number; ceilingMa: number | null; aboveCeiling: boolean };

export type AmplitudeRow = {
  checkInId: string;
  day: string;
  x: number;
  versionNumber: number | null;
  loggedBy: LoggedBy;
  /** One per channel, in the order of `channels`; null where the session had no such channel. */
  readings: (AmplitudeReading | null)[];
};

/** A stretch of the time axis over which one channel's ceiling stayed the same. */
export type CeilingStep = { fromX: number; toX: number; ceilingMa: number; versionNumbers: number[] };

// A reading is compared with the ceiling of the version the session was measured against, which is what the
// client's device was set to, even when a newer version had been published by then.
export function amplitudeRows(placed: PlacedCheckIn[], channels: ChannelSeries[], versions: TrendVersion[]): AmplitudeRow[] {
  const sorted = sortVersions(versions);
  return placed.map((checkIn) => {
    const version = sorted.find((v) => v.number === checkIn.versionNumber) ?? versionInForce(checkIn.sessionDate, sorted);
    return {
      checkInId: checkIn.id,
      day: checkIn.sessionDate,
      x: checkIn.x,
      versionNumber: checkIn.versionNumber,
      loggedBy: checkIn.loggedBy,
      readings: channels.map((channel) => {
        const reading = checkIn.channels.find((c) => c.channelId === channel.id);
        if (!reading) return null;
        const ceilingMa = version?.channels.find((c) => c.id === channel.id)?.ceilingMa ?? null;
        return { amplitudeMa: reading.amplitudeMa, ceilingMa, aboveCeiling: ceilingMa !== null && reading.amplitudeMa > ceilingMa };
      }),
    };
  });
}

export type AmplitudePoint = Record<string, number | boolean | null>;

/**
 * The rows as the chart reads them: `x`, one key per channel (null, a gap in the line, where the session had no
 * such channel) and `<key>Above`, true where that reading went above its ceiling.
 */
export function amplitudeChartData(rows: AmplitudeRow[], channels: ChannelSeries[]): AmplitudePoint[] {
  return rows.map((row) => {
    const point: AmplitudePoint = { x: row.x };
    channels.forEach((channel, i) => {
      point[channel.key] = row.readings[i]?.amplitudeMa ?? null;
      point[`${channel.key}Above`] = row.readings[i]?.aboveCeiling ?? false;
    });
    return point;
  });
}

// Each version is in force from the start of its publication day until the next version's day; a version replaced
// on its own day never was in force. Where the version in force has no such channel there is no step.
export function ceilingSteps(channel: ChannelSeries, versions: TrendVersion[], domainEnd: number): CeilingStep[] {
  const sorted = sortVersions(versions);
  const steps: CeilingStep[] = [];
  sorted.forEach((version, i) => {
    const fromX = dayNumber(version.publishedOn);
    const next = sorted[i + 1];
    const toX = next ? dayNumber(next.publishedOn) : Math.max(domainEnd, fromX);
    const ceilingMa = version.channels.find((c) => c.id === channel.id)?.ceilingMa;
    if (toX <= fromX || ceilingMa === undefined) return;
    const last = steps.at(-1);
    if (last && last.toX === fromX && last.ceilingMa === ceilingMa) {
      last.toX = toX;
      last.versionNumbers.push(version.number);
    } else {
      steps.push({ fromX, toX, ceilingMa, versionNumbers: [version.number] });
    }
  });
  return steps;
}
