export { adherenceByWeek, adherenceOver, adherenceOverLastDays, programmeToDate, type WeekAdherence } from "./reports";
export type { Measure, PeriodAdherence } from "./measure";
export { calendarWeeks, dayRange, lastDaysRange, type CalendarWeek, type DayRange } from "./ranges";
export { prescriptionOn, programmeLastDay, type DayPrescription } from "./prescription";
export type { AdherenceInput, AdherenceSchedule, CheckInRecord, PublishedVersion } from "./input";
export { isUnderHalf, percentForDisplay, UNDER_HALF, type AdherenceMeasure } from "./flags";
export { addDays, AdherenceInputError, dayNumber, eachDay, mondayOf, type IsoDay } from "./days";
// Deprecated: the first shape of this module, until lib/rules and lib/trends have moved over.
export { adherenceFor, cappedPercent, lastDays, prescribedOn, programmeAdherence, versionOn, weeklyAdherence, type LoggedSession, type Period, type VersionSchedule } from "./legacy";
export { daysBetween } from "./days";
