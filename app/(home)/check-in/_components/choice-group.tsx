import type { UseFormRegisterReturn } from "react-hook-form";
import { Choice } from "@/components/ui/choice-fields";
import { FieldError } from "@/components/ui/text-field";

// A large radio group with its legend and its error announced with it.
export function ChoiceGroup({ legend, options, registration, error, hint }: {
  legend: string;
  options: { value: string; label: string; hint?: string }[];
  registration: UseFormRegisterReturn;
  error?: string;
  hint?: string;
}) {
  const errorId = `${registration.name.replace(/\W/g, "-")}-error`;
  return (
    <fieldset className="flex flex-col gap-1" aria-describedby={error ? errorId : undefined}>
      <legend className="mb-1 text-xl font-bold">{legend}</legend>
      {hint ? <p className="text-sm text-ink-soft">{hint}</p> : null}
      {options.map((option) => (
        <Choice key={option.value} label={option.label} hint={option.hint} value={option.value} {...registration} />
      ))}
      {error ? <FieldError id={errorId} message={error} /> : null}
    </fieldset>
  );
}
