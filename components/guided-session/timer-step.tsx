"use client";

import { Button } from "@/components/ui/button";
import type { ChannelTimerState, ClockStatus } from "@/lib/session-timer";
import { ChannelTimer } from "./channel-timer";
import { OtherChannels } from "./other-channels";
import { FollowsAlong, StopIfItHurts } from "./session-safety";
import type { SessionChannel, SessionWords } from "./session-plan";
import { SoundToggle } from "./sound-toggle";
import { TimerControls } from "./timer-controls";
import { shortDuration } from "./timer-words";

const allChannels = (n: number) => (n === 2 ? "Channels 1 and 2" : `Channels 1 to ${n}`);

export type TimerStepProps = {
  channels: SessionChannel[];
  states: ChannelTimerState[];
  shared: boolean;
  status: ClockStatus;
  minutesPerSession: number;
  announcement: string;
  words: SessionWords;
  reducedMotion: boolean;
  soundOn: boolean;
  onSound: (on: boolean) => void;
  onClock: (type: "start" | "pause" | "resume" | "stop") => void;
  onBack: () => void;
};

// Step 2. Children keep their places whether or not the timer has started (a slot stays empty rather than
// disappearing), so React keeps the same main button and focus stays on it when it is pressed.
export function TimerStep(props: TimerStepProps) {
  const { channels, states, shared, status, words } = props;
  const first = states[0]!;
  const ready = status === "ready";
  const paused = status === "paused";
  const mode = ready ? "ready" : paused ? "paused" : "running";
  const mainLabel = shared && channels.length > 1 ? allChannels(channels.length) : channels[0]!.label;
  return (
    <div className="flex flex-col gap-6">
      {ready ? (
        <p>
          Switch the stimulator on as {words.your} therapist showed you, with the strength at zero. Press the button at
          the moment the stimulator&apos;s programme starts, so the timer and the stimulator keep in step.
        </p>
      ) : null}
      <section aria-labelledby="main-channel" className="flex flex-col gap-3 rounded-lg border-2 border-ink bg-card p-4">
        <h3 id="main-channel" className="text-lg">
          {mainLabel}
          {shared && channels.length > 1 ? <span className="block text-base font-normal">One cycle, the same on every channel</span> : null}
        </h3>
        <ChannelTimer
          label={mainLabel}
          cycle={channels[0]!.cycle}
          state={first}
          mode={mode}
          reducedMotion={props.reducedMotion}
          aside={
            <p role="timer" aria-label="Session time left">
              <span className="font-bold">{shortDuration(first.sessionSecondsLeft)}</span> left of {props.minutesPerSession} min
            </p>
          }
        />
      </section>
      <TimerControls
        status={status}
        doneText={`${shortDuration(first.elapsedSeconds)} of ${props.minutesPerSession} min done.`}
        onStart={() => props.onClock("start")}
        onPause={() => props.onClock("pause")}
        onResume={() => props.onClock("resume")}
        onStop={() => props.onClock("stop")}
      />
      {paused ? (
        <p className="font-bold">
          The timer has stopped counting, but the stimulator has not. Pause the stimulator too if it can pause, and
          resume both together.
        </p>
      ) : null}
      <StopIfItHurts your={words.your} />
      <SoundToggle on={props.soundOn} onChange={props.onSound} />
      {shared ? null : <OtherChannels channels={channels.slice(1)} states={states.slice(1)} mode={mode} reducedMotion={props.reducedMotion} />}
      <FollowsAlong your={words.your} />
      {ready ? (
        <Button large variant="secondary" onClick={props.onBack} className="w-full">
          Back to the checklist
        </Button>
      ) : null}
      <p role="status" className="sr-only">
        {props.announcement}
      </p>
    </div>
  );
}
