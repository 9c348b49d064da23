"use client";
import { useId, type ReactNode } from "react";
import { useFormContext } from "react-hook-form";
import { FieldError } from "@/components/ui/text-field";
import type { ScreeningFormValues } from "@/lib/screening/schema";
import { useFieldError, type ScreeningPath } from "./use-field-error";

export type Option = { value: string; label: string };
export const YES_NO_OPTIONS: Option[] = [
  { value: "yes", label: "Yes" },
  { value: "no", label: "No" },
];

export function optionsFrom(labels: Record<string, string>): Option[] {
  return Object.entries(labels).map(([value, label]) => ({ value, label }));
}

// A question answered by choosing one option: a fieldset whose legend is the question, each option a whole-row
// target of at least 44 px, the error in words and announced with every option (aria-invalid is not allowed on a
// radio, so the message itself, through aria-describedby, carries the problem).
export function RadioGroup({ name, legend, hint, options = YES_NO_OPTIONS, inline }: {
  name: ScreeningPath;
  legend: ReactNode;
  hint?: string;
  options?: Option[];
  inline?: boolean;
}) {
  const { register } = useFormContext<ScreeningFormValues>();
  const error = useFieldError(name);
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(" ") || undefined;
  return (
    <fieldset className="flex flex-col gap-1" aria-describedby={describedBy}>
      <legend className="mb-1 font-bold">{legend}</legend>
      {hint ? (
        <p id={hintId} className="text-sm text-ink-soft">
          {hint}
        </p>
      ) : null}
      <div className={inline ? "flex flex-wrap gap-x-4" : "flex flex-col"}>
        {options.map((option) => (
          <label key={option.value} className="flex min-h-11 min-w-24 cursor-pointer items-center gap-3 rounded-md px-2 hover:bg-line-soft">
            <input
              type="radio"
              value={option.value}
              className="size-5 shrink-0 accent-ink"
              aria-describedby={describedBy}
              {...register(name)}
            />
            <span>{option.label}</span>
          </label>
        ))}
      </div>
      {error ? <FieldError id={errorId!} message={error} /> : null}
    </fieldset>
  );
}
