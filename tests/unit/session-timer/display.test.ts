import { describe, expect, it } from "vitest";
import { minutesAndSeconds, secondsToShow } from "@/lib/session-timer";

describe("countdown figures", () => {
  it("rounds up to the whole second, as a countdown reads", () => {
    // worked example (our own arithmetic): 4 s left shows 4; 3.9 s and 4.2 s show 4 and 5; 0.5 s shows 1.
    expect(secondsToShow(4)).toBe(4);
    expect(secondsToShow(3.9)).toBe(4);
    expect(secondsToShow(4.2)).toBe(5);
    expect(secondsToShow(0.5)).toBe(1);
    expect(secondsToShow(0)).toBe(0);
    expect(secondsToShow(-1)).toBe(0);
  });

  it("ignores floating-point dust", () => {
    expect(secondsToShow(4.0000000001)).toBe(4);
    expect(secondsToShow(0.1 + 0.2)).toBe(1);
  });

  it("splits minutes and seconds", () => {
    // worked example (our own arithmetic): 1792 s = 29 × 60 + 52.
    expect(minutesAndSeconds(1792)).toEqual({ minutes: 29, seconds: 52 });
    // worked example (our own arithmetic): 59.5 s left rounds up to a whole minute.
    expect(minutesAndSeconds(59.5)).toEqual({ minutes: 1, seconds: 0 });
  });
});
