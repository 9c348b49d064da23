// Dates on the screening screens. Rampline's clinics work in UK time, so a signing time is shown in Europe/London
// whatever the server's zone; calendar dates (YYYY-MM-DD) are shown as the date they name.
const dateTime = new Intl.DateTimeFormat("en-GB", {
  day: "numeric",
  month: "short",
  year: "numeric",
  hour: "2-digit",
  minute: "2-digit",
  timeZone: "Europe/London",
});
const calendarDate = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

export function formatMoment(value: Date | string): string {
  return dateTime.format(new Date(value));
}

export function formatCalendarDate(iso: string): string {
  return calendarDate.format(new Date(`${iso}T00:00:00Z`));
}

export function isBeforeToday(iso: string, now = new Date()): boolean {
  return iso < now.toISOString().slice(0, 10);
}
