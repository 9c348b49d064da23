import { dayNumber } from "./days";
import { formatDay, versionLabel } from "./format";
import type { TrendVersion } from "./types";

export type VersionMarker = {
  day: string;
  x: number;
  numbers: number[];
  /** What the chart writes beside the line: "v2", or "v1, v2" when both were published on the same day. */
  label: string;
  /** The same in words, for tables and descriptions. */
  description: string;
};

// The same order as lib/adherence: by day, then by number, so the last version of a day is the one in force.
export function sortVersions<T extends TrendVersion>(versions: T[]): T[] {
  return [...versions].sort((a, b) => (a.publishedOn === b.publishedOn ? a.number - b.number : a.publishedOn < b.publishedOn ? -1 : 1));
}

export function versionInForce<T extends TrendVersion>(day: string, sorted: T[]): T | null {
  let found: T | null = null;
  for (const version of sorted) if (version.publishedOn <= day) found = version;
  return found;
}

// Versions published on one day share one line: two lines on the same spot would print their labels on top of
// each other.
export function versionMarkers(versions: TrendVersion[]): VersionMarker[] {
  const byDay = new Map<string, number[]>();
  for (const version of sortVersions(versions)) byDay.set(version.publishedOn, [...(byDay.get(version.publishedOn) ?? []), version.number]);
  return [...byDay].map(([day, numbers]) => ({
    day,
    x: dayNumber(day),
    numbers,
    label: versionLabel(numbers),
    description: `${numbers.length > 1 ? "Versions" : "Version"} ${numbers.join(" and ")} published ${formatDay(day)}`,
  }));
}
