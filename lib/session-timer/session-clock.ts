// The session's stopwatch as a reducer. Every action carries the moment it happened (`nowMs`, from whatever clock
// the caller reads), so nothing in here reads the time itself and a fake clock drives it exactly. Paused time is
// never counted: only the spans between start or resume and pause, stop or the end add up.

export type ClockStatus = "ready" | "running" | "paused" | "stopped" | "finished";

export type SessionClock = {
  status: ClockStatus;
  sessionMs: number;
  /** Time counted before the current run (all of it once paused, stopped or finished). */
  bankedMs: number;
  /** When the current run began (start or the last resume); null unless running. */
  runningSinceMs: number | null;
  /** The latest moment the clock has been told of; null before it starts. */
  nowMs: number | null;
};

export type ClockAction = { type: "start" | "pause" | "resume" | "stop" | "tick"; nowMs: number };

export function createSessionClock(minutesPerSession: number): SessionClock {
  return { status: "ready", sessionMs: Math.round(minutesPerSession * 60_000), bankedMs: 0, runningSinceMs: null, nowMs: null };
}

/** Milliseconds counted so far, up to the last moment the clock was told of, never beyond the session. */
export function elapsedMs(clock: SessionClock): number {
  const running = clock.status === "running" && clock.runningSinceMs !== null && clock.nowMs !== null ? clock.nowMs - clock.runningSinceMs : 0;
  return Math.min(clock.bankedMs + Math.max(running, 0), clock.sessionMs);
}

// Moves a running clock on to `nowMs`, finishing it if the session's time has run out by then. A clock read from
// Date.now() can be set back by the system; time then stands still rather than running backwards.
function advance(clock: SessionClock, nowMs: number): SessionClock {
  if (clock.status !== "running" || clock.runningSinceMs === null || clock.nowMs === null) return clock;
  if (nowMs === clock.nowMs) return clock;
  const runningSinceMs = nowMs < clock.nowMs ? clock.runningSinceMs + (nowMs - clock.nowMs) : clock.runningSinceMs;
  const moved = { ...clock, runningSinceMs, nowMs };
  if (elapsedMs(moved) < clock.sessionMs) return moved;
  return { ...moved, status: "finished", bankedMs: clock.sessionMs, runningSinceMs: null };
}

function bank(clock: SessionClock, status: "paused" | "stopped"): SessionClock {
  return { ...clock, status, bankedMs: elapsedMs(clock), runningSinceMs: null };
}

export function sessionClockReducer(clock: SessionClock, action: ClockAction): SessionClock {
  switch (action.type) {
    case "start":
      if (clock.status !== "ready") return clock;
      return { ...clock, status: "running", bankedMs: 0, runningSinceMs: action.nowMs, nowMs: action.nowMs };
    case "tick":
      return advance(clock, action.nowMs);
    case "pause": {
      const moved = advance(clock, action.nowMs);
      return moved.status === "running" ? bank(moved, "paused") : moved;
    }
    case "resume":
      if (clock.status !== "paused") return clock;
      return { ...clock, status: "running", runningSinceMs: action.nowMs, nowMs: action.nowMs };
    case "stop": {
      const moved = advance(clock, action.nowMs);
      return moved.status === "running" || moved.status === "paused" ? bank(moved, "stopped") : moved;
    }
  }
}

/** Whole minutes done, rounded down: what the session log is offered. */
export function wholeMinutesDone(clock: SessionClock): number {
  return Math.floor(elapsedMs(clock) / 60_000);
}
