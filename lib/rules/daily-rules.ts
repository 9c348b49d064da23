import { addDays, isUnderHalf, lastDays, type LoggedSession, type VersionSchedule } from "@/lib/adherence";
import type { RaisedFlag } from "./check-in-rules";

// Rules a scheduled job runs each day for every client with a programme in force. Thresholds are common practice
// (no published source): under half the prescription over 7 days, or no session logged for 4 days.
export const DAILY_RULES = { lowAdherence: "adherence-under-half-7-days", silence: "no-check-in-4-days" } as const;
export const SILENCE_DAYS = 4;
export const ADHERENCE_WINDOW_DAYS = 7;

export function dailyFlags(versions: VersionSchedule[], sessions: LoggedSession[], today: string): RaisedFlag[] {
  const first = [...versions].sort((a, b) => (a.publishedOn < b.publishedOn ? -1 : 1))[0];
  if (!first || first.publishedOn > today) return [];
  const flags: RaisedFlag[] = [];
  // A programme only a day or two old has not had the chance to fall behind.
  if (first.publishedOn <= addDays(today, -(ADHERENCE_WINDOW_DAYS - 1))) {
    const window = lastDays(ADHERENCE_WINDOW_DAYS, today, versions, sessions);
    if (isUnderHalf(window)) {
      flags.push({
        rule: DAILY_RULES.lowAdherence,
        severity: "review",
        title: `Under half the prescription over the last ${ADHERENCE_WINDOW_DAYS} days`,
        detail: { ...window },
      });
    }
  }
  const lastLogged = sessions.map((s) => s.sessionDate).sort().at(-1) ?? null;
  const quietSince = lastLogged && lastLogged > first.publishedOn ? lastLogged : first.publishedOn;
  if (quietSince <= addDays(today, -SILENCE_DAYS)) {
    flags.push({
      rule: DAILY_RULES.silence,
      severity: "review",
      title: lastLogged ? `No session logged since ${lastLogged}` : "No session logged since the programme started",
      detail: { lastLogged, since: quietSince },
    });
  }
  return flags;
}
