import {
  createSessionClock,
  sessionClockReducer,
  wholeMinutesDone,
  type ClockAction,
  type SessionClock,
} from "@/lib/session-timer";

// The whole guided session as one pure reducer: which step is showing, what is ticked, and the session clock.
// The clock's end (time over, or stopped) moves the flow on to step 3 in the same update, with the minutes done.

export type Step = 1 | 2 | 3;

export type FlowState = {
  step: Step;
  /** Ids of the ticked items of both checklists. */
  ticked: string[];
  clock: SessionClock;
  /** Whole minutes done, once the session has ended. */
  minutesDone: number | null;
};

export type FlowAction =
  | { type: "tick-item"; id: string; checked: boolean }
  | { type: "go-to"; step: 1 | 2 }
  | { type: "clock"; action: ClockAction }
  | { type: "restore"; state: FlowState };

export function initialFlow(minutesPerSession: number): FlowState {
  return { step: 1, ticked: [], clock: createSessionClock(minutesPerSession), minutesDone: null };
}

export function flowReducer(state: FlowState, action: FlowAction): FlowState {
  switch (action.type) {
    case "tick-item": {
      const without = state.ticked.filter((id) => id !== action.id);
      return { ...state, ticked: action.checked ? [...without, action.id] : without };
    }
    case "go-to":
      // Back and Next only move between the steps before the clock has started; after that only the clock
      // (its end, or Stop) moves the session on, so a running timer is never left behind on another step.
      if (state.clock.status !== "ready") return state;
      return { ...state, step: action.step };
    case "clock": {
      const clock = sessionClockReducer(state.clock, action.action);
      if (clock === state.clock) return state;
      const ended = clock.status === "finished" || clock.status === "stopped";
      return ended ? { ...state, clock, step: 3, minutesDone: wholeMinutesDone(clock) } : { ...state, clock };
    }
    case "restore":
      return action.state;
  }
}

export const allTicked = (state: FlowState, ids: readonly string[]) => ids.every((id) => state.ticked.includes(id));
