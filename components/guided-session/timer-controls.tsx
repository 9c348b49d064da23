"use client";

import { useEffect, useRef, useState } from "react";
import { Button, buttonClasses } from "@/components/ui/button";
import type { ClockStatus } from "@/lib/session-timer";

// Start, Pause/Resume and Stop. The main button is one element whose words change, so focus stays on it when
// the timer starts, pauses or resumes. Stop asks first, inline, with focus moved to the question and Escape (or
// "No, carry on") going back to where it was.
export function TimerControls({
  status,
  doneText,
  onStart,
  onPause,
  onResume,
  onStop,
}: {
  status: ClockStatus;
  doneText: string;
  onStart: () => void;
  onPause: () => void;
  onResume: () => void;
  onStop: () => void;
}) {
  const [confirming, setConfirming] = useState(false);
  const question = useRef<HTMLHeadingElement>(null);
  const stopButton = useRef<HTMLButtonElement>(null);
  const returnFocus = useRef(false);

  useEffect(() => {
    if (confirming) question.current?.focus();
    else if (returnFocus.current) stopButton.current?.focus();
    returnFocus.current = false;
  }, [confirming]);

  const carryOn = () => {
    returnFocus.current = true;
    setConfirming(false);
  };

  if (confirming) {
    return (
      <div
        role="group"
        aria-labelledby="stop-question"
        className="flex flex-col gap-4 rounded-lg border-2 border-ink bg-card p-5"
        onKeyDown={(event) => {
          if (event.key === "Escape") carryOn();
        }}
      >
        <h3 id="stop-question" ref={question} tabIndex={-1} className="text-2xl">
          Stop the session now?
        </h3>
        <p>
          {doneText} The timer stops here: turn the stimulator off too.
        </p>
        <Button large onClick={onStop} className="w-full">
          Yes, stop the session
        </Button>
        <Button large variant="secondary" onClick={carryOn} className="w-full">
          No, carry on
        </Button>
      </div>
    );
  }

  const main =
    status === "ready"
      ? { text: "My stimulator is running: start the timer", act: onStart }
      : status === "paused"
        ? { text: "Resume the timer", act: onResume }
        : { text: "Pause the timer", act: onPause };
  return (
    <div className={`grid gap-3 ${status === "ready" ? "" : "grid-cols-2"}`}>
      <Button large onClick={main.act} className="w-full">
        {main.text}
      </Button>
      {status === "running" || status === "paused" ? (
        <button ref={stopButton} type="button" onClick={() => setConfirming(true)} className={`${buttonClasses("secondary", true)} w-full`}>
          Stop the session
        </button>
      ) : null}
    </div>
  );
}
