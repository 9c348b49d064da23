import { describe, expect, it } from "vitest";
import {
  channelTimerState,
  createSessionClock,
  elapsedMs,
  sessionClockReducer,
  wholeMinutesDone,
  type ClockAction,
  type SessionClock,
} from "@/lib/session-timer";

// A made-up wall-clock reading for "now"; only differences between readings matter.
const T0 = 1_770_000_000_000;
const run = (actions: Array<[ClockAction["type"], number]>, minutes = 30): SessionClock =>
  actions.reduce((clock, [type, offsetMs]) => sessionClockReducer(clock, { type, nowMs: T0 + offsetMs }), createSessionClock(minutes));

describe("sessionClockReducer", () => {
  it("counts nothing until started", () => {
    const clock = run([["tick", 5_000], ["pause", 6_000], ["resume", 7_000]]);
    expect(clock.status).toBe("ready");
    expect(elapsedMs(clock)).toBe(0);
  });

  it("counts from the moment of start", () => {
    // worked example (our own arithmetic): started at T0 + 1 s, told T0 + 7.5 s: 6.5 s counted.
    const clock = run([["start", 1_000], ["tick", 7_500]]);
    expect(clock.status).toBe("running");
    expect(elapsedMs(clock)).toBe(6_500);
    expect(channelTimerState({ rampUpS: 1, holdS: 5, rampDownS: 1, restS: 20 }, 30, elapsedMs(clock) / 1000).phase).toBe("ramp-down");
  });

  it("does not count a 60 s pause", () => {
    // worked example (our own arithmetic): 10 s run, 60 s paused, 1 s run = 11 s counted, 71 s on the wall clock.
    const paused = run([["start", 0], ["tick", 10_000], ["pause", 10_000], ["tick", 70_000]]);
    expect(paused.status).toBe("paused");
    expect(elapsedMs(paused)).toBe(10_000);
    const resumed = run([["start", 0], ["pause", 10_000], ["tick", 40_000], ["resume", 70_000], ["tick", 71_000]]);
    expect(resumed.status).toBe("running");
    expect(elapsedMs(resumed)).toBe(11_000);
  });

  it("adds up several pauses", () => {
    // worked example (our own arithmetic): runs of 5 s, 7 s and 3 s with pauses between them: 15 s counted.
    const clock = run([["start", 0], ["pause", 5_000], ["resume", 20_000], ["pause", 27_000], ["resume", 100_000], ["tick", 103_000]]);
    expect(elapsedMs(clock)).toBe(15_000);
  });

  it("finishes at the end of the session, however late the next tick comes", () => {
    // worked example (our own arithmetic): 30 minutes = 1,800,000 ms.
    expect(run([["start", 0], ["tick", 1_799_999]]).status).toBe("running");
    const finished = run([["start", 0], ["tick", 1_800_000]]);
    expect(finished).toMatchObject({ status: "finished", bankedMs: 1_800_000, runningSinceMs: null });
    // One tick long after the end (a phone woken from sleep) lands on the end, not beyond it.
    const late = run([["start", 0], ["tick", 5_000_000]]);
    expect(late.status).toBe("finished");
    expect(elapsedMs(late)).toBe(1_800_000);
    expect(wholeMinutesDone(late)).toBe(30);
  });

  it("finishes with the pause counted out", () => {
    // worked example (our own arithmetic): 1 minute session, 30 s run, 60 s pause, then the last 30 s end at 120 s.
    const clock = run([["start", 0], ["pause", 30_000], ["resume", 90_000], ["tick", 119_999]], 1);
    expect(clock.status).toBe("running");
    expect(sessionClockReducer(clock, { type: "tick", nowMs: T0 + 120_000 }).status).toBe("finished");
  });

  it("stops early with what was done, rounded down to whole minutes", () => {
    // worked example (our own arithmetic): 12 min 40 s done is 12 whole minutes.
    const clock = run([["start", 0], ["stop", 760_000]]);
    expect(clock.status).toBe("stopped");
    expect(elapsedMs(clock)).toBe(760_000);
    expect(wholeMinutesDone(clock)).toBe(12);
    // Stopping from a pause keeps the paused total.
    expect(elapsedMs(run([["start", 0], ["pause", 90_000], ["stop", 500_000]]))).toBe(90_000);
  });

  it("reports the end rather than a pause or stop pressed after the time ran out", () => {
    expect(run([["start", 0], ["pause", 1_900_000]]).status).toBe("finished");
    expect(run([["start", 0], ["stop", 1_900_000]]).status).toBe("finished");
  });

  it("ignores actions that do not fit the state", () => {
    const finished = run([["start", 0], ["tick", 1_800_000]]);
    for (const type of ["start", "pause", "resume", "stop", "tick"] as const) {
      expect(sessionClockReducer(finished, { type, nowMs: T0 + 2_000_000 })).toBe(finished);
    }
    const running = run([["start", 0]]);
    expect(sessionClockReducer(running, { type: "start", nowMs: T0 + 5_000 })).toBe(running);
    expect(sessionClockReducer(running, { type: "resume", nowMs: T0 + 5_000 })).toBe(running);
    // The same moment twice changes nothing, so React can skip the render.
    expect(sessionClockReducer(running, { type: "tick", nowMs: T0 })).toBe(running);
  });

  it("stands still rather than running backwards when the wall clock is set back", () => {
    // worked example (our own arithmetic): 20 s counted, the clock jumps back 1 hour, then 5 s pass: 25 s.
    const clock = run([["start", 0], ["tick", 20_000], ["tick", 20_000 - 3_600_000], ["tick", 25_000 - 3_600_000]]);
    expect(elapsedMs(clock)).toBe(25_000);
  });
});
