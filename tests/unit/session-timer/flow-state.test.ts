import { describe, expect, it } from "vitest";
import { allTicked, flowReducer, initialFlow, type FlowAction, type FlowState } from "@/components/guided-session/flow-state";

const T0 = 1_770_000_000_000;
const apply = (actions: FlowAction[], minutes = 30): FlowState => actions.reduce(flowReducer, initialFlow(minutes));
const clock = (type: "start" | "pause" | "resume" | "stop" | "tick", offsetMs: number): FlowAction => ({ type: "clock", action: { type, nowMs: T0 + offsetMs } });

describe("the guided session's flow", () => {
  it("ticks and unticks items, once each", () => {
    const state = apply([
      { type: "tick-item", id: "a", checked: true },
      { type: "tick-item", id: "a", checked: true },
      { type: "tick-item", id: "b", checked: true },
      { type: "tick-item", id: "a", checked: false },
    ]);
    expect(state.ticked).toEqual(["b"]);
    expect(allTicked(state, ["b"])).toBe(true);
    expect(allTicked(state, ["a", "b"])).toBe(false);
  });

  it("moves between steps 1 and 2 only before the timer starts", () => {
    expect(apply([{ type: "go-to", step: 2 }]).step).toBe(2);
    expect(apply([{ type: "go-to", step: 2 }, { type: "go-to", step: 1 }]).step).toBe(1);
    const started = apply([{ type: "go-to", step: 2 }, clock("start", 0), { type: "go-to", step: 1 }]);
    expect(started.step).toBe(2);
  });

  it("goes to step 3 with the whole session when the time is over", () => {
    // worked example (our own arithmetic): 30 minutes run, with a 60 s pause that does not count: over at 1860 s.
    const state = apply([{ type: "go-to", step: 2 }, clock("start", 0), clock("pause", 100_000), clock("resume", 160_000), clock("tick", 1_859_999)]);
    expect(state.step).toBe(2);
    const over = flowReducer(state, clock("tick", 1_860_000));
    expect(over).toMatchObject({ step: 3, minutesDone: 30 });
  });

  it("goes to step 3 with the whole minutes done when stopped early", () => {
    // worked example (our own arithmetic): stopped at 5 min 59 s: 5 whole minutes.
    expect(apply([{ type: "go-to", step: 2 }, clock("start", 0), clock("stop", 359_000)])).toMatchObject({ step: 3, minutesDone: 5 });
  });

  it("returns the same state for a tick that changes nothing, so nothing redraws", () => {
    const paused = apply([{ type: "go-to", step: 2 }, clock("start", 0), clock("pause", 1_000)]);
    expect(flowReducer(paused, clock("tick", 9_000))).toBe(paused);
  });
});
