import { describe, expect, it } from "vitest";
import { channelTimerState } from "@/lib/session-timer";

// Cycles here are invented to exercise the arithmetic; none is a recommendation.
const short = { rampUpS: 1, holdS: 5, rampDownS: 1, restS: 20 }; // a 27 s cycle
const at = (elapsed: number, cycle = short, minutes = 30) => channelTimerState(cycle, minutes, elapsed);

describe("channelTimerState: where the cycle has reached", () => {
  it("starts in the ramp-up of cycle 1", () => {
    // worked example (our own arithmetic): at 0 s the 1 s ramp-up has all of its 1 s left.
    expect(at(0)).toMatchObject({ phase: "ramp-up", phaseSeconds: 1, phaseSecondsLeft: 1, cycle: 1, secondsIntoCycle: 0, over: false });
  });

  it("is in the ramp-down with 0.5 s left at 6.5 s", () => {
    // worked example (our own arithmetic): ramp-up 0–1 s, hold 1–6 s, ramp-down 6–7 s, so 6.5 s leaves 7 − 6.5 = 0.5 s.
    expect(at(6.5)).toMatchObject({ phase: "ramp-down", phaseSecondsLeft: 0.5, cycle: 1, secondsIntoCycle: 6.5 });
  });

  it("changes phase exactly on each boundary", () => {
    // worked example (our own arithmetic): a phase runs from its start up to, not including, its end.
    expect(at(0.999).phase).toBe("ramp-up");
    expect(at(1)).toMatchObject({ phase: "hold", phaseSecondsLeft: 5 });
    expect(at(6)).toMatchObject({ phase: "ramp-down", phaseSecondsLeft: 1 });
    expect(at(7)).toMatchObject({ phase: "rest", phaseSeconds: 20, phaseSecondsLeft: 20 });
    expect(at(26.9).phase).toBe("rest");
    expect(at(26.9).phaseSecondsLeft).toBeCloseTo(0.1, 9);
  });

  it("starts cycle 2 at 27 s", () => {
    // worked example (our own arithmetic): 1 + 5 + 1 + 20 = 27 s per cycle.
    expect(at(27)).toMatchObject({ phase: "ramp-up", cycle: 2, secondsIntoCycle: 0, cycleSeconds: 27 });
    // worked example (our own arithmetic): 60 s = 2 × 27 s + 6 s, so the third cycle's ramp-down is just starting.
    expect(at(60)).toMatchObject({ phase: "ramp-down", cycle: 3, secondsIntoCycle: 6 });
  });

  it("ends a 30-minute session at 1800 s and holds there", () => {
    // worked example (our own arithmetic): 30 × 60 = 1800 s.
    expect(at(1799.9)).toMatchObject({ over: false });
    expect(at(1799.9).sessionSecondsLeft).toBeCloseTo(0.1, 9);
    // worked example (our own arithmetic): 1800 = 66 × 27 + 18, so the session ends 18 s into cycle 67, in its rest.
    expect(at(1800)).toMatchObject({ over: true, sessionSecondsLeft: 0, cycle: 67, phase: "rest", phaseSecondsLeft: 0, secondsIntoCycle: 18 });
    expect(at(5000)).toEqual(at(1800));
    expect(at(-3)).toEqual(at(0));
  });

  it("never counts a phase beyond the end of the session", () => {
    // worked example (our own arithmetic): 1795 s is 13 s into a cycle, in a rest that would end at 27 s (14 s
    // away), but the session ends 5 s from now.
    expect(at(1795)).toMatchObject({ phase: "rest", phaseSecondsLeft: 5, sessionSecondsLeft: 5 });
  });

  it("reports the phase that was running when the session ended, not the one that would start", () => {
    // worked example (our own arithmetic): 2 s up, 4 s hold, 2 s down, 12 s rest = 20 s; 1 minute is exactly 3 cycles.
    const even = { rampUpS: 2, holdS: 4, rampDownS: 2, restS: 12 };
    expect(at(60, even, 1)).toMatchObject({ over: true, cycle: 3, phase: "rest", secondsIntoCycle: 20 });
  });

  it("follows a continuous programme (no rest) straight from ramp-down to the next ramp-up", () => {
    const continuous = { rampUpS: 2, holdS: 6, rampDownS: 2, restS: 0 };
    // worked example (our own arithmetic): 2 + 6 + 2 = 10 s a cycle; at 9.5 s the ramp-down (8–10 s) has 0.5 s left.
    expect(at(9.5, continuous)).toMatchObject({ phase: "ramp-down", phaseSecondsLeft: 0.5, cycle: 1, continuous: false });
    // worked example (our own arithmetic): at 10 s the second cycle's ramp-up begins; no rest in between.
    expect(at(10, continuous)).toMatchObject({ phase: "ramp-up", cycle: 2, phaseSecondsLeft: 2 });
    const phases = new Set(Array.from({ length: 400 }, (_, i) => at(i * 0.25, continuous).phase));
    expect(phases.has("rest")).toBe(false);
  });

  it("skips ramps of no length", () => {
    const noRamps = { rampUpS: 0, holdS: 5, rampDownS: 0, restS: 10 };
    // worked example (our own arithmetic): with no ramp-up the cycle opens on the hold: 5 s left at 0 s.
    expect(at(0, noRamps)).toMatchObject({ phase: "hold", phaseSecondsLeft: 5, cycle: 1 });
    // worked example (our own arithmetic): hold 0–5 s, then rest 5–15 s with no ramp-down between.
    expect(at(5, noRamps)).toMatchObject({ phase: "rest", phaseSecondsLeft: 10 });
    // worked example (our own arithmetic): 15 s = one whole 15 s cycle, so cycle 2 opens on its hold.
    expect(at(15, noRamps)).toMatchObject({ phase: "hold", cycle: 2 });
    const phases = new Set(Array.from({ length: 200 }, (_, i) => at(i * 0.1, noRamps).phase));
    expect([...phases].sort()).toEqual(["hold", "rest"]);
  });

  it("treats a hold with no ramps and no rest as one phase lasting the whole session", () => {
    const unbroken = { rampUpS: 0, holdS: 10, rampDownS: 0, restS: 0 };
    // worked example (our own arithmetic): 20 minutes = 1200 s; at 100 s, 1100 s are left in the hold and the session.
    expect(at(100, unbroken, 20)).toMatchObject({ phase: "hold", continuous: true, phaseSecondsLeft: 1100, sessionSecondsLeft: 1100 });
  });

  it("does not divide by zero for a cycle of no length (never publishable)", () => {
    const none = { rampUpS: 0, holdS: 0, rampDownS: 0, restS: 0 };
    expect(at(30, none, 1)).toMatchObject({ phase: "rest", continuous: true, cycle: 1, secondsIntoCycle: 0, sessionSecondsLeft: 30 });
  });

  it("keeps boundaries exact with tenths of a second", () => {
    // worked example (our own arithmetic): 0.1 + 0.2 s of ramp-up and hold end at exactly 0.3 s, where in plain
    // floating point 0.1 + 0.2 is 0.30000000000000004 and the hold would last a hair too long.
    const tenths = { rampUpS: 0.1, holdS: 0.2, rampDownS: 0.3, restS: 0.4 };
    expect(at(0.3, tenths)).toMatchObject({ phase: "ramp-down", phaseSecondsLeft: 0.3 });
    // worked example (our own arithmetic): 0.1 + 0.2 + 0.3 + 0.4 = 1 s a cycle; 3 s begins cycle 4.
    expect(at(3, tenths)).toMatchObject({ phase: "ramp-up", cycle: 4, secondsIntoCycle: 0 });
  });
});
