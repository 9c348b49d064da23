// Calendar days as "yyyy-mm-dd" strings, counted in UTC so that no time zone or clock change shifts a day. The
// caller passes days already in the clinic's own calendar (Europe/London).
const DAY_MS = 24 * 60 * 60 * 1000;
const ISO_DAY = /^\d{4}-\d{2}-\d{2}$/;

export function assertDay(day: string, what: string): void {
  if (!ISO_DAY.test(day) || Number.isNaN(Date.parse(`${day}T00:00:00Z`))) throw new Error(`${what} must be a day written yyyy-mm-dd, not "${day}".`);
}

export function addDays(day: string, days: number): string {
  return new Date(Date.parse(`${day}T00:00:00Z`) + days * DAY_MS).toISOString().slice(0, 10);
}

export function daysBetween(first: string, last: string): string[] {
  const days: string[] = [];
  for (let day = first; day <= last; day = addDays(day, 1)) days.push(day);
  return days;
}

// Weeks run Monday to Sunday and are named by their Monday.
export function mondayOf(day: string): string {
  const weekday = new Date(`${day}T00:00:00Z`).getUTCDay(); // 0 is Sunday
  return addDays(day, -((weekday + 6) % 7));
}
