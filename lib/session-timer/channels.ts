import type { CycleSettings } from "@/lib/stim";
import { channelTimerState, type ChannelTimerState } from "./cycle-position";

// Every channel starts with the session and runs its own cycle. The programme records no offset between channels,
// so none is assumed: a stimulator that alternates its channels is followed as if they started together.

export function sessionTimerStates(channels: readonly CycleSettings[], minutesPerSession: number, elapsedSeconds: number): ChannelTimerState[] {
  return channels.map((cycle) => channelTimerState(cycle, minutesPerSession, elapsedSeconds));
}

const sameCycle = (a: CycleSettings, b: CycleSettings) =>
  a.rampUpS === b.rampUpS && a.holdS === b.holdS && a.rampDownS === b.rampDownS && a.restS === b.restS;

/** True when one timer can stand for every channel (one channel, or all with the same four times). */
export function sharesOneCycle(channels: readonly CycleSettings[]): boolean {
  const [first, ...rest] = channels;
  return first === undefined || rest.every((cycle) => sameCycle(first, cycle));
}
