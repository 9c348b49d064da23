import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { ChannelTimer } from "@/components/guided-session/channel-timer";
import { sessionWords } from "@/components/guided-session/session-plan";
import { TimerStep, type TimerStepProps } from "@/components/guided-session/timer-step";
import { channelTimerState } from "@/lib/session-timer";

const text = (html: string) => html.replace(/<[^>]+>/g, " ").replaceAll("\u00a0", " ").replace(/\s+/g, " ");
const a = { rampUpS: 1, holdS: 5, rampDownS: 1, restS: 25 };
const b = { rampUpS: 2, holdS: 4, rampDownS: 2, restS: 12 };
const channels = [
  { id: "ch-1", label: "Channel 1: Wrist and finger flexors", cycle: a },
  { id: "ch-2", label: "Channel 2: Wrist and finger extensors", cycle: b },
];

function timerStep(overrides: Partial<TimerStepProps>) {
  const props: TimerStepProps = {
    channels: channels.slice(0, 1),
    states: [channelTimerState(a, 30, 0)],
    shared: true,
    status: "ready",
    minutesPerSession: 30,
    announcement: "",
    words: sessionWords(null),
    reducedMotion: false,
    soundOn: false,
    onSound: () => undefined,
    onClock: () => undefined,
    onBack: () => undefined,
    ...overrides,
  };
  return renderToStaticMarkup(<TimerStep {...props} />);
}

describe("the timer's drawing", () => {
  it("hides only the ribbon's own cycle label, which is its SVG's first group", () => {
    // channel-timer.tsx hides `svg > g:first-of-type` because a one-cycle ribbon always calls itself "Cycle 1";
    // if the ribbon's markup changes, this shows the selector needs to follow it.
    const html = renderToStaticMarkup(<ChannelTimer label="Channel 1" cycle={a} state={channelTimerState(a, 30, 40)} mode="running" reducedMotion={false} />);
    const svg = /<svg[^>]*viewBox="0 0 360[^>]*>([\s\S]*?)<\/svg>/.exec(html)?.[1] ?? "";
    const firstGroup = /<g[^>]*>([\s\S]*?)<\/g>/.exec(svg)?.[1] ?? "";
    expect(text(firstGroup).trim()).toBe("Cycle 1");
    // The real cycle number (40 s is in the second 32 s cycle) is written beside the drawing.
    expect(text(html)).toContain("Cycle 2");
    expect(html).toMatch(/aria-hidden="true" class="relative overflow-hidden/);
  });

  it("steps the fill by whole seconds when reduced motion is asked for", () => {
    const state = channelTimerState(a, 30, 2.6);
    const smooth = renderToStaticMarkup(<ChannelTimer label="C" cycle={a} state={state} mode="running" reducedMotion={false} />);
    const stepped = renderToStaticMarkup(<ChannelTimer label="C" cycle={a} state={state} mode="running" reducedMotion />);
    expect(text(smooth)).toContain("Filled to 2.6 s");
    expect(text(stepped)).toContain("Filled to 2 s");
  });
});

describe("step 2", () => {
  it("before the start: says the timer follows the stimulator, with one button to start it", () => {
    const html = text(timerStep({}));
    expect(html).toContain("My stimulator is running: start the timer");
    expect(html).toContain("Rampline does not control your stimulator");
    expect(html).toContain("Stop and check your skin if it hurts or burns");
    expect(html).not.toContain("Stop the session");
    // Not a running phase before the start: "Ready", and what comes first.
    expect(html).toMatch(/Ready Starts with ramp up/);
    expect(html).not.toContain("left in this phase");
  });

  it("shows every channel's own timer when the cycles differ, channel 1 first and largest", () => {
    const states = [channelTimerState(a, 30, 10), channelTimerState(b, 30, 10)];
    const html = timerStep({ channels, states, shared: false, status: "running" });
    expect(html.match(/role="timer"/g)).toHaveLength(3);
    expect(text(html)).toMatch(/Channel 1: Wrist and finger flexors.*Rest.*22 s.*Channel 2: Wrist and finger extensors.*Rest.*10 s/);
  });

  it("shows one timer for channels that share a cycle", () => {
    const same = [channels[0]!, { ...channels[1]!, cycle: a }];
    const html = timerStep({ channels: same, states: [channelTimerState(a, 30, 3), channelTimerState(a, 30, 3)], shared: true, status: "running" });
    expect(html.match(/role="timer"/g)).toHaveLength(2);
    expect(text(html)).toContain("Channels 1 and 2 One cycle, the same on every channel");
  });

  it("says a paused timer is not a paused stimulator", () => {
    const html = text(timerStep({ status: "paused", states: [channelTimerState(a, 30, 8)] }));
    expect(html).toContain("Paused");
    expect(html).toContain("Resume the timer");
    expect(html).toContain("the stimulator has not");
  });
});
