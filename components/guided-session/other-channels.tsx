import type { ChannelTimerState } from "@/lib/session-timer";
import { ChannelTimer } from "./channel-timer";
import type { TimerMode } from "./phase-panel";
import type { SessionChannel } from "./session-plan";

// Channels 2 onwards when their cycles differ from channel 1's: the same facts, drawn smaller.
export function OtherChannels({
  channels,
  states,
  mode,
  reducedMotion,
}: {
  channels: SessionChannel[];
  states: ChannelTimerState[];
  mode: TimerMode;
  reducedMotion: boolean;
}) {
  if (channels.length === 0) return null;
  return (
    <div className="flex flex-col gap-4">
      {channels.map((channel, index) => (
        <section key={channel.id} aria-labelledby={`timer-${channel.id}`} className="rounded-lg border border-line bg-card p-4">
          <h3 id={`timer-${channel.id}`} className="mb-3 text-lg">
            {channel.label}
          </h3>
          <ChannelTimer label={channel.label} cycle={channel.cycle} state={states[index]!} mode={mode} reducedMotion={reducedMotion} size="small" />
        </section>
      ))}
    </div>
  );
}
