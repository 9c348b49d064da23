import { describe, expect, it } from "vitest";
import { DAILY_RULES, dailyFlags } from "@/lib/rules/daily-rules";

// Invented programme: 1 session of 30 minutes, 7 days a week, from Monday 2 November 2026.
const versions = [{ number: 1, publishedOn: "2026-11-02", schedule: { minutesPerSession: 30, sessionsPerDay: 1, daysPerWeek: 7 } }];
const logged = (...days: string[]) => days.map((sessionDate) => ({ sessionDate, minutes: 30 }));
const rules = (sessions: ReturnType<typeof logged>, today: string) => dailyFlags(versions, sessions, today).map((f) => f.rule);

describe("the daily rules", () => {
  it("flag adherence under half of the prescription over the last 7 days", () => {
    // common practice (no published source). worked example (our own arithmetic): 7 sessions prescribed over
    // 10–16 November; 3 logged is 43 % (under half), 4 is 57 %.
    expect(rules(logged("2026-11-12", "2026-11-14", "2026-11-16"), "2026-11-16")).toContain(DAILY_RULES.lowAdherence);
    expect(rules(logged("2026-11-10", "2026-11-12", "2026-11-14", "2026-11-16"), "2026-11-16")).not.toContain(DAILY_RULES.lowAdherence);
  });

  it("do not judge adherence in a programme's first week", () => {
    expect(rules([], "2026-11-05")).not.toContain(DAILY_RULES.lowAdherence);
  });

  it("flag 4 days without a session, counted from the last one or from the start", () => {
    // common practice (no published source): 4 days of silence is worth a call.
    expect(rules(logged("2026-11-12"), "2026-11-15")).not.toContain(DAILY_RULES.silence);
    expect(rules(logged("2026-11-12"), "2026-11-16")).toContain(DAILY_RULES.silence);
    expect(rules([], "2026-11-05")).not.toContain(DAILY_RULES.silence);
    expect(rules([], "2026-11-06")).toContain(DAILY_RULES.silence);
  });

  it("raise nothing before a programme exists", () => {
    expect(dailyFlags([], [], "2026-11-20")).toEqual([]);
  });
});
