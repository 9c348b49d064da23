import type { TrendCheckIn, TrendVersion } from "@/lib/trends";

// Invented programmes and sessions. 2 March 2026 is a Monday.
export const schedule = { minutesPerSession: 30, sessionsPerDay: 1, daysPerWeek: 5, weeks: 12 };

export function version(number: number, publishedOn: string, channels: [string, number][], target = "Wrist extensors"): TrendVersion {
  return { id: `version-${number}`, number, publishedOn, channels: channels.map(([id, ceilingMa]) => ({ id, target: `${target} ${id}`, ceilingMa })), schedule };
}

let sequence = 0;

export function checkIn(sessionDate: string, amplitudes: Record<string, number>, options: Partial<TrendCheckIn> = {}): TrendCheckIn {
  sequence += 1;
  const ids = Object.keys(amplitudes);
  return {
    id: `check-in-${sequence}`,
    sessionDate,
    loggedAt: new Date(`${sessionDate}T18:00:00Z`),
    minutes: 30,
    comfort: 7,
    versionNumber: 1,
    channels: ids.map((channelId) => ({ channelId, amplitudeMa: amplitudes[channelId]! })),
    skin: ids.flatMap((channelId) => (["A", "B"] as const).map((electrode) => ({ channelId, electrode, level: 1 }))),
    loggedBy: { name: "Callum Reid", role: "client" },
    ...options,
  };
}
