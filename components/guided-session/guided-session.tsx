"use client";

import { useMemo } from "react";
import { elapsedMs, sessionTimerStates, sharesOneCycle } from "@/lib/session-timer";
import { AfterStep } from "./after-step";
import { BeforeStep } from "./before-step";
import { allTicked } from "./flow-state";
import { afterChecklist, beforeChecklist, type SessionPlan, type SessionWords } from "./session-plan";
import { StepHeading } from "./step-heading";
import { opensCycle, phaseAnnouncement } from "./timer-words";
import { TimerStep } from "./timer-step";
import { useGuidedSession } from "./use-guided-session";
import { usePhaseSound } from "./use-phase-sound";
import { useReducedMotion } from "./use-reduced-motion";
import { useWakeLock } from "./use-wake-lock";

// The guided session: three steps on one page, so the timer and the ticks survive moving between them. What
// each step shows is worked out here from the flow's state; the steps themselves only draw it.
export function GuidedSession({ plan, words }: { plan: SessionPlan; words: SessionWords }) {
  const { state, dispatch, clockAction, forget } = useGuidedSession(plan.versionId, plan.minutesPerSession);
  const { step, clock, ticked } = state;
  const before = useMemo(() => beforeChecklist(plan), [plan]);
  const after = useMemo(() => afterChecklist(plan), [plan]);
  const cycles = useMemo(() => plan.channels.map((channel) => channel.cycle), [plan]);
  const shared = sharesOneCycle(cycles);
  const states = sessionTimerStates(cycles, plan.minutesPerSession, elapsedMs(clock) / 1000);
  const first = states[0]!;

  const running = clock.status === "running";
  const phaseKey = running ? `${first.cycle}:${first.phase}` : null;
  const { soundOn, setSoundOn } = usePhaseSound(phaseKey, running ? first.phase : null);
  useWakeLock(running);
  const reducedMotion = useReducedMotion();

  // Only channel 1 (or the shared timer) is announced: several channels speaking at once would be noise.
  const prefix = shared || plan.channels.length === 1 ? "" : "Channel 1: ";
  const announcement = running ? phaseAnnouncement(first, opensCycle(first), prefix) : clock.status === "paused" ? "Timer paused." : "";

  const onTick = (id: string, checked: boolean) => dispatch({ type: "tick-item", id, checked });

  return (
    <div className="flex flex-col gap-6">
      <StepHeading step={step} />
      {step === 1 ? (
        <BeforeStep
          items={before}
          ticked={ticked}
          ownCautions={plan.ownCautions}
          words={words}
          onTick={onTick}
          onNext={() => {
            if (allTicked(state, before.map((item) => item.id))) dispatch({ type: "go-to", step: 2 });
          }}
        />
      ) : null}
      {step === 2 ? (
        <TimerStep
          channels={plan.channels}
          states={states}
          shared={shared}
          status={clock.status}
          minutesPerSession={plan.minutesPerSession}
          announcement={announcement}
          words={words}
          reducedMotion={reducedMotion}
          soundOn={soundOn}
          onSound={setSoundOn}
          onClock={clockAction}
          onBack={() => dispatch({ type: "go-to", step: 1 })}
        />
      ) : null}
      {step === 3 ? (
        <AfterStep
          minutesDone={state.minutesDone ?? 0}
          minutesPerSession={plan.minutesPerSession}
          items={after}
          ticked={ticked}
          words={words}
          onTick={onTick}
          onLeave={forget}
        />
      ) : null}
    </div>
  );
}
