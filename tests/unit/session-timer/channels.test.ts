import { describe, expect, it } from "vitest";
import { sessionTimerStates, sharesOneCycle } from "@/lib/session-timer";

const a = { rampUpS: 1, holdS: 5, rampDownS: 1, restS: 25 };
const b = { rampUpS: 2, holdS: 4, rampDownS: 2, restS: 12 };

describe("several channels", () => {
  it("follows each channel's own cycle", () => {
    // worked example (our own arithmetic): at 10 s channel A (32 s cycle) rests, 25 s from 7 s to 32 s; channel B
    // (20 s cycle) rests from 8 s to 20 s, so 10 s are left.
    const [first, second] = sessionTimerStates([a, b], 30, 10);
    expect(first).toMatchObject({ phase: "rest", phaseSecondsLeft: 22, cycle: 1 });
    expect(second).toMatchObject({ phase: "rest", phaseSecondsLeft: 10, cycle: 1 });
    // worked example (our own arithmetic): at 21 s channel B is 1 s into cycle 2's 2 s ramp-up; A still rests.
    const [later, laterB] = sessionTimerStates([a, b], 30, 21);
    expect(later?.phase).toBe("rest");
    expect(laterB).toMatchObject({ phase: "ramp-up", cycle: 2, phaseSecondsLeft: 1 });
  });

  it("uses one timer only when every channel has the same four times", () => {
    expect(sharesOneCycle([a])).toBe(true);
    expect(sharesOneCycle([a, { ...a }])).toBe(true);
    expect(sharesOneCycle([a, b])).toBe(false);
    expect(sharesOneCycle([a, { ...a, restS: 24 }])).toBe(false);
    expect(sharesOneCycle([])).toBe(true);
  });
});
