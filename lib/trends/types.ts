import type { SkinLevel } from "@/lib/check-ins/skin-scale";

// What the trend shaping needs from the database, already reduced to plain values so the functions stay pure and
// can be tested without PostgreSQL. `publishedOn` and `sessionDate` are Europe/London calendar days (yyyy-mm-dd).

export type TrendChannel = { id: string; target: string; ceilingMa: number };

export type TrendVersion = {
  id: string;
  number: number;
  publishedOn: string;
  channels: TrendChannel[];
  /** `weeks` counts from the first version's day; after it nothing is prescribed (lib/adherence). */
  schedule: { minutesPerSession: number; sessionsPerDay: number; daysPerWeek: number; weeks: number };
};

export type LoggedBy = { name: string; role: "client" | "carer" };

export type TrendCheckIn = {
  id: string;
  sessionDate: string;
  /** When the entry was saved; orders two sessions logged for the same day. */
  loggedAt: Date;
  minutes: number;
  comfort: number;
  /** The version the session was measured against; null if that version no longer exists. */
  versionNumber: number | null;
  channels: { channelId: string; amplitudeMa: number }[];
  skin: { channelId: string; electrode: "A" | "B"; level: number }[];
  loggedBy: LoggedBy;
};

/** A check-in placed on the time axis: `x` is in days since 1 January 1970, inside its own day. */
export type PlacedCheckIn = TrendCheckIn & { x: number };

export type WorstSkin = { level: SkinLevel; sites: { channelId: string; electrode: "A" | "B" }[] };
