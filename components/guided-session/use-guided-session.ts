"use client";

import { useCallback, useEffect, useReducer, useRef } from "react";
import type { ClockAction } from "@/lib/session-timer";
import { flowReducer, initialFlow } from "./flow-state";
import { restoreSession, savedSessionKey, serialiseSession } from "./saved-session";

/**
 * The timer is driven by setInterval, not requestAnimationFrame: a frame callback stops entirely in a background
 * tab, while an interval keeps running there (slowed to about once a second), so a sound cue still comes when the
 * client is not looking. Each tick only reads Date.now(); the position is worked out from the moments recorded,
 * never by counting ticks, so a slow or skipped tick shows up as nothing worse than a late redraw. Date.now()
 * rather than performance.now() because it carries on across a phone's sleep and is comparable after a reload.
 * 250 ms keeps each whole-second change within a quarter of a second of the truth without redrawing 60 times a
 * second for half an hour.
 */
export const TICK_MS = 250;

export function useGuidedSession(versionId: string, minutesPerSession: number) {
  const [state, dispatch] = useReducer(flowReducer, minutesPerSession, initialFlow);
  const key = savedSessionKey(versionId);
  const restored = useRef(false);

  useEffect(() => {
    try {
      const saved = restoreSession(window.sessionStorage.getItem(key), minutesPerSession, Date.now());
      if (saved) dispatch({ type: "restore", state: saved });
    } catch {
      // Storage can be switched off; the session then simply starts afresh on a reload.
    }
    restored.current = true;
  }, [key, minutesPerSession]);

  // Saved whenever something other than the moment of the last tick changes, so not four times a second.
  const { step, ticked, minutesDone, clock } = state;
  useEffect(() => {
    if (!restored.current) return;
    try {
      window.sessionStorage.setItem(key, serialiseSession({ step, ticked, minutesDone, clock }, Date.now()));
    } catch {
      // As above: without storage a reload starts afresh.
    }
    // eslint-disable-next-line react-hooks/exhaustive-deps -- clock.nowMs changes on every tick and is left out on purpose
  }, [key, step, ticked, minutesDone, clock.status, clock.bankedMs, clock.runningSinceMs]);

  const running = clock.status === "running";
  useEffect(() => {
    if (!running) return;
    const tick = () => dispatch({ type: "clock", action: { type: "tick", nowMs: Date.now() } });
    tick();
    const id = window.setInterval(tick, TICK_MS);
    document.addEventListener("visibilitychange", tick);
    return () => {
      window.clearInterval(id);
      document.removeEventListener("visibilitychange", tick);
    };
  }, [running]);

  const clockAction = useCallback((type: ClockAction["type"]) => dispatch({ type: "clock", action: { type, nowMs: Date.now() } }), []);
  const forget = useCallback(() => {
    try {
      window.sessionStorage.removeItem(key);
    } catch {
      // Nothing to forget.
    }
  }, [key]);

  return { state, dispatch, clockAction, forget };
}
