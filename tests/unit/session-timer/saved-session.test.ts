import { describe, expect, it } from "vitest";
import { flowReducer, initialFlow, type FlowState } from "@/components/guided-session/flow-state";
import { restoreSession, SAVED_SESSION_LIFETIME_MS, serialiseSession } from "@/components/guided-session/saved-session";

const T0 = 1_770_000_000_000;
const running: FlowState = flowReducer({ ...initialFlow(30), step: 2, ticked: ["prep-0"] }, { type: "clock", action: { type: "start", nowMs: T0 } });

describe("a session saved for a reload", () => {
  it("comes back as it was", () => {
    expect(restoreSession(serialiseSession(running, T0), 30, T0 + 5_000)).toEqual(running);
  });

  it("is ignored when it is not a saved session, or is for a different length of session", () => {
    expect(restoreSession(null, 30, T0)).toBeNull();
    expect(restoreSession("not json", 30, T0)).toBeNull();
    expect(restoreSession(JSON.stringify({ savedAtMs: T0, state: { step: 7 } }), 30, T0)).toBeNull();
    expect(restoreSession(serialiseSession(running, T0), 20, T0)).toBeNull();
  });

  it("keeps a running session until two hours after it was due to end", () => {
    // worked example (our own arithmetic): started at T0, 30 minutes, so due to end at T0 + 30 min; kept to 2 h 30 min.
    const raw = serialiseSession(running, T0);
    expect(restoreSession(raw, 30, T0 + 30 * 60_000 + SAVED_SESSION_LIFETIME_MS)).not.toBeNull();
    expect(restoreSession(raw, 30, T0 + 30 * 60_000 + SAVED_SESSION_LIFETIME_MS + 1)).toBeNull();
  });

  it("keeps anything else for two hours after it was saved", () => {
    const ticked = { ...initialFlow(30), ticked: ["prep-0", "placed"] };
    const raw = serialiseSession(ticked, T0);
    expect(restoreSession(raw, 30, T0 + SAVED_SESSION_LIFETIME_MS)).toEqual(ticked);
    expect(restoreSession(raw, 30, T0 + SAVED_SESSION_LIFETIME_MS + 1)).toBeNull();
  });
});
