import type { AdherenceRow } from "./adherence";
import type { AmplitudeRow } from "./amplitude";
import type { ChannelSeries } from "./channels";
import { formatCount, formatMa, formatPercent, formatShortDay, wholePercent } from "./format";
import type { SessionRow } from "./sessions";
import { skinLevelWords } from "./skin";

// One sentence per chart, saying what a sighted reader would take from it at a glance. Rows are in time order.

const plural = (n: number, one: string, many = `${one}s`) => `${formatCount(n)} ${n === 1 ? one : many}`;

export function amplitudeSummary(rows: AmplitudeRow[], channels: ChannelSeries[]): string {
  const parts = channels.flatMap((channel, i) => {
    const readings = rows.flatMap((row) => (row.readings[i] ? [{ day: row.day, ...row.readings[i] }] : []));
    const first = readings[0];
    const last = readings.at(-1);
    if (!first || !last) return [];
    const above = readings.filter((r) => r.aboveCeiling).length;
    const span =
      readings.length === 1
        ? `reached ${formatMa(first.amplitudeMa)} on ${formatShortDay(first.day)}`
        : `went from ${formatMa(first.amplitudeMa)} on ${formatShortDay(first.day)} to ${formatMa(last.amplitudeMa)} on ${formatShortDay(last.day)}`;
    return [`${channel.shortLabel} ${span}${above > 0 ? `, ${plural(above, "session")} above its ceiling` : ""}`];
  });
  return parts.length === 0 ? "No amplitudes recorded yet." : `${parts.join("; ")}.`;
}

export function comfortSummary(rows: SessionRow[]): string {
  const last = rows.at(-1);
  if (!last) return "No sessions logged yet.";
  const values = rows.map((row) => row.comfort);
  const range = rows.length === 1 ? "" : `Comfort ranged from ${Math.min(...values)} to ${Math.max(...values)} out of 10 over ${plural(rows.length, "session")}; `;
  return `${range}${rows.length === 1 ? "The" : "the"} latest, on ${formatShortDay(last.day)}, was ${last.comfort} out of 10 (0 is very uncomfortable, 10 completely comfortable).`;
}

export function skinSummary(rows: SessionRow[]): string {
  const levels = rows.flatMap((row) => (row.worstSkinLevel === null ? [] : [row.worstSkinLevel]));
  if (levels.length === 0) return "No skin checks recorded yet.";
  const highest = Math.max(...levels) as 1 | 2 | 3 | 4 | 5;
  const atHighest = rows.filter((row) => row.worstSkinLevel === highest);
  const lastAtHighest = atHighest.at(-1)!;
  const clear = levels.filter((level) => level === 1).length;
  const when = atHighest.length === 1 ? `on ${formatShortDay(lastAtHighest.day)}` : `in ${plural(atHighest.length, "session")}, last on ${formatShortDay(lastAtHighest.day)}`;
  const worst = highest === 1 ? "No change to the skin was reported" : `The worst was level ${highest}, ${skinLevelWords(highest).toLowerCase()}, ${when}`;
  return `${worst}; ${plural(clear, "session")} of ${formatCount(levels.length)} had no change under any electrode.`;
}

// Summed from the weekly rows, so the sentence always describes exactly the weeks the chart shows.
export function adherenceSummary(rows: AdherenceRow[]): string {
  const sum = (pick: (row: AdherenceRow) => number) => rows.reduce((total, row) => total + pick(row), 0);
  const prescribedSessions = sum((r) => r.prescribedSessions);
  const prescribedMinutes = sum((r) => r.prescribedMinutes);
  if (prescribedSessions === 0) return "Nothing has been prescribed yet.";
  const deliveredSessions = sum((r) => r.deliveredSessions);
  const deliveredMinutes = sum((r) => r.deliveredMinutes);
  const percent = (done: number, due: number) => formatPercent(wholePercent(done / due));
  return (
    `Over ${plural(rows.length, "week")}, ${formatCount(deliveredSessions)} of ${formatCount(prescribedSessions)} prescribed sessions (${percent(deliveredSessions, prescribedSessions)}) ` +
    `and ${formatCount(deliveredMinutes)} of ${formatCount(prescribedMinutes)} prescribed minutes (${percent(deliveredMinutes, prescribedMinutes)}) were done.`
  );
}
