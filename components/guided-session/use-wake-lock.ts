"use client";

import { useEffect } from "react";

/**
 * Keeps the screen on while the timer runs, where the browser offers a screen wake lock: a client with one free
 * hand should not have to keep tapping a dimming phone. The lock is dropped by the browser whenever the tab is
 * hidden, so it is asked for again when the tab comes back. Failure (no support, battery saver) is harmless.
 */
export function useWakeLock(active: boolean) {
  useEffect(() => {
    if (!active || !("wakeLock" in navigator)) return;
    let sentinel: WakeLockSentinel | null = null;
    let cancelled = false;
    const request = () => {
      if (document.visibilityState !== "visible") return;
      navigator.wakeLock
        .request("screen")
        .then((lock) => {
          if (cancelled) void lock.release();
          else sentinel = lock;
        })
        .catch(() => undefined);
    };
    request();
    document.addEventListener("visibilitychange", request);
    return () => {
      cancelled = true;
      document.removeEventListener("visibilitychange", request);
      void sentinel?.release().catch(() => undefined);
    };
  }, [active]);
}
