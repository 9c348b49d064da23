import type { CheckIn, ProgrammeVersion } from "@/db/schema";
import type { ProgrammeContent } from "@/lib/programmes/content";
import { londonDay } from "./days";
import type { TrendCheckIn, TrendVersion } from "./types";

// From the query rows to the plain shapes the trends are built from. A version is in force from the clinic's
// calendar day of its publication (Europe/London), as the adherence rules read it.

export function toTrendVersion(version: Pick<ProgrammeVersion, "id" | "number" | "publishedAt" | "content">): TrendVersion {
  const content = version.content as ProgrammeContent;
  return {
    id: version.id,
    number: version.number,
    publishedOn: londonDay(version.publishedAt),
    channels: content.channels.map((channel) => ({ id: channel.id, target: channel.target, ceilingMa: channel.settings.amplitudeCeilingMa })),
    schedule: {
      minutesPerSession: content.schedule.minutesPerSession,
      sessionsPerDay: content.schedule.sessionsPerDay,
      daysPerWeek: content.schedule.daysPerWeek,
      weeks: content.schedule.weeks,
    },
  };
}

export function toTrendCheckIn(row: { checkIn: CheckIn; loggedByName: string; versionNumber: number | null }): TrendCheckIn {
  const { checkIn } = row;
  return {
    id: checkIn.id,
    sessionDate: checkIn.sessionDate,
    loggedAt: checkIn.createdAt,
    minutes: checkIn.minutes,
    comfort: checkIn.comfort,
    versionNumber: row.versionNumber,
    channels: checkIn.channels.map(({ channelId, amplitudeMa }) => ({ channelId, amplitudeMa })),
    skin: checkIn.skin.map(({ channelId, electrode, level }) => ({ channelId, electrode, level })),
    loggedBy: { name: row.loggedByName, role: checkIn.loggedByRole },
  };
}
