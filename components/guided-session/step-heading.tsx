"use client";

import { useEffect, useRef } from "react";
import type { Step } from "./flow-state";

export const STEP_TITLES: Record<Step, string> = { 1: "Before you start", 2: "The session timer", 3: "After the session" };

/**
 * "Step 2 of 3" and the step's name in one heading, with a three-part bar drawn beside it. When the step changes
 * (not on the first load) focus moves to the heading, so a screen reader says where the person now is and the
 * keyboard starts from the top of the new step.
 */
export function StepHeading({ step }: { step: Step }) {
  const heading = useRef<HTMLHeadingElement>(null);
  const shown = useRef<Step | null>(null);
  useEffect(() => {
    if (shown.current !== null && shown.current !== step) heading.current?.focus();
    shown.current = step;
  }, [step]);
  return (
    <div className="flex flex-col gap-3">
      <div aria-hidden className="grid grid-cols-3 gap-2">
        {([1, 2, 3] as const).map((n) => (
          <span key={n} className={`h-2 rounded-full ${n <= step ? "bg-ink" : "bg-line"}`} />
        ))}
      </div>
      <h2 ref={heading} tabIndex={-1} className="text-3xl">
        <span className="block text-lg font-bold text-ink-soft">Step {step} of 3</span>
        {STEP_TITLES[step]}
      </h2>
    </div>
  );
}
