import { dayOfNumber } from "./days";

// Words and figures for the trends, in British English. Days are written from their own parts rather than through
// Intl, whose abbreviations differ between ICU versions ("Sep" or "Sept"), so the server's tables and the browser's
// tooltips always agree.
const MONTHS = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];
const WEEKDAYS = ["Sun", "Mon", "Tue", "Wed", "Thu", "Fri", "Sat"];

/** "3 Mar", for axis ticks and sentences within one programme. */
export function formatShortDay(day: string): string {
  const [, month, date] = day.split("-").map(Number);
  return `${date} ${MONTHS[month! - 1]}`;
}

/** "Tue 3 Mar 2026" */
export function formatDay(day: string): string {
  const weekday = WEEKDAYS[new Date(`${day}T00:00:00Z`).getUTCDay()];
  return `${weekday} ${formatShortDay(day)} ${day.slice(0, 4)}`;
}

/** An axis position (day number, possibly inside the day) as its short day. */
export function formatTick(x: number): string {
  return formatShortDay(dayOfNumber(x));
}

/** British grouping, at most one decimal: prescriptions spread over a week are often fractional. */
export function formatCount(value: number): string {
  return value.toLocaleString("en-GB", { maximumFractionDigits: 1 });
}

export function formatMa(value: number): string {
  return `${value.toLocaleString("en-GB", { maximumFractionDigits: 1 })}\u00a0mA`;
}

/**
 * A ratio as a whole percentage, rounded down as lib/adherence's display helper does, so 79.6 % never reads as
 * 80 % met; the small allowance keeps 0.29 × 100 = 28.999… at 29. Not capped. Null when nothing was prescribed.
 */
export function wholePercent(ratio: number | null): number | null {
  return ratio === null ? null : Math.floor(ratio * 100 + 1e-7);
}

export function formatPercent(percent: number | null): string {
  return percent === null ? "nothing prescribed" : `${percent.toLocaleString("en-GB")}%`;
}

export function versionLabel(numbers: number[]): string {
  return numbers.map((n) => `v${n}`).join(", ");
}

/** A carer's entry is always shown as the carer's, in words, wherever a session is listed. */
export function loggedByText(loggedBy: { name: string; role: "client" | "carer" }): string {
  return loggedBy.role === "carer" ? `${loggedBy.name} (carer)` : loggedBy.name;
}

/** "4 of 7.9 prescribed (50%)": the figure as it really is, above 100 % included. */
export function measureText(delivered: number, prescribed: number, percent: number | null): string {
  if (percent === null) return `${formatCount(delivered)} done, nothing prescribed`;
  return `${formatCount(delivered)} of ${formatCount(prescribed)} prescribed (${formatPercent(percent)})`;
}
