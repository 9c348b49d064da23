import { z } from "zod";
import type { FlowState } from "./flow-state";

// A reload (a pull-to-refresh by a shaky hand, a phone that drops the tab) must not lose a session that is running:
// the stimulator carries on regardless. The flow is kept in sessionStorage (this tab only, gone when it closes),
// and because the clock is a record of wall-clock moments, a restored timer is as exact as one never interrupted.

export const savedSessionKey = (versionId: string) => `rampline:guided-session:${versionId}`;

/** How long a saved session is worth restoring after it was last saved, or after a running one was due to end. */
export const SAVED_SESSION_LIFETIME_MS = 2 * 60 * 60 * 1000;

const clockSchema = z.object({
  status: z.enum(["ready", "running", "paused", "stopped", "finished"]),
  sessionMs: z.number().nonnegative(),
  bankedMs: z.number().nonnegative(),
  runningSinceMs: z.number().nullable(),
  nowMs: z.number().nullable(),
});

const savedSchema = z.object({
  savedAtMs: z.number(),
  state: z.object({
    step: z.union([z.literal(1), z.literal(2), z.literal(3)]),
    ticked: z.array(z.string()).max(100),
    clock: clockSchema,
    minutesDone: z.number().int().nonnegative().nullable(),
  }),
});

export function serialiseSession(state: FlowState, savedAtMs: number): string {
  return JSON.stringify({ savedAtMs, state });
}

/** The saved flow if it is for a session of this length and recent enough to be the same session; null otherwise. */
export function restoreSession(raw: string | null, minutesPerSession: number, nowMs: number): FlowState | null {
  if (!raw) return null;
  let parsed: z.infer<typeof savedSchema>;
  try {
    const result = savedSchema.safeParse(JSON.parse(raw));
    if (!result.success) return null;
    parsed = result.data;
  } catch {
    return null;
  }
  const { state, savedAtMs } = parsed;
  if (state.clock.sessionMs !== Math.round(minutesPerSession * 60_000)) return null;
  const { clock } = state;
  const dueToEndMs = clock.status === "running" && clock.runningSinceMs !== null ? clock.runningSinceMs + clock.sessionMs - clock.bankedMs : savedAtMs;
  if (nowMs > Math.max(savedAtMs, dueToEndMs) + SAVED_SESSION_LIFETIME_MS) return null;
  return state;
}
