import type { AdherenceInput, CheckInRecord, PublishedVersion } from "@/lib/adherence";

// Invented programmes (demo data, not clinical advice). 2 November 2026 is a Monday; weeks run Monday to Sunday.
export const MON = "2026-11-02";
export const WED = "2026-11-04";
export const THU = "2026-11-05";

/** 1 session of 30 min, 5 days a week, for 6 weeks: 5 sessions and 150 minutes a week. */
export const v1: PublishedVersion = {
  id: "ver-1",
  number: 1,
  publishedOn: MON,
  schedule: { minutesPerSession: 30, sessionsPerDay: 1, daysPerWeek: 5, weeks: 6 },
};

/** From Thursday: 2 sessions of 20 min, 5 days a week: 10 sessions and 200 minutes a week. */
export const v2: PublishedVersion = {
  id: "ver-2",
  number: 2,
  publishedOn: THU,
  schedule: { minutesPerSession: 20, sessionsPerDay: 2, daysPerWeek: 5, weeks: 6 },
};

export const logged = (minutes: number, ...days: string[]): CheckInRecord[] => days.map((sessionDate) => ({ sessionDate, minutes }));

export const input = (versions: PublishedVersion[], checkIns: CheckInRecord[] = []): AdherenceInput => ({ versions, checkIns });

export function version(number: number, publishedOn: string, schedule: Partial<PublishedVersion["schedule"]> = {}): PublishedVersion {
  return { id: `ver-${number}`, number, publishedOn, schedule: { ...v1.schedule, ...schedule } };
}
