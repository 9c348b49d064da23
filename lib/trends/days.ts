// Calendar days as "yyyy-mm-dd" and as day numbers (days since 1 January 1970), counted in UTC so that no clock
// change moves a day. Only `londonDay` knows about time zones: it turns an instant into the clinic's calendar day.
const DAY_MS = 24 * 60 * 60 * 1000;

// en-CA writes dates as yyyy-mm-dd, which is the form every day in Rampline is stored in.
const londonFormat = new Intl.DateTimeFormat("en-CA", { timeZone: "Europe/London", year: "numeric", month: "2-digit", day: "2-digit" });

export function londonDay(at: Date): string {
  return londonFormat.format(at);
}

export function dayNumber(day: string): number {
  return Math.round(Date.parse(`${day}T00:00:00Z`) / DAY_MS);
}

export function dayOfNumber(n: number): string {
  return new Date(Math.floor(n) * DAY_MS).toISOString().slice(0, 10);
}
