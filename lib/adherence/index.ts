export { adherenceFor, cappedPercent, isUnderHalf, lastDays, prescribedOn, programmeAdherence, versionOn, weeklyAdherence, type LoggedSession, type Period, type VersionSchedule } from "./adherence";
export { addDays, daysBetween, mondayOf } from "./days";
