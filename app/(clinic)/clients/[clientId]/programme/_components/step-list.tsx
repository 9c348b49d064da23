"use client";
import { useFieldArray, type Control, type UseFormRegister } from "react-hook-form";
import { Button } from "@/components/ui/button";
import type { ProgrammeFormValues } from "@/lib/programmes/form-values";

type ListName = "skinPreparation" | "electrodeCare" | "ownCautions";

// An editable, ordered list of plain-language steps; the order is the order the client follows.
export function StepList({ name, legend, hint, control, register, addLabel }: {
  name: ListName;
  legend: string;
  hint?: string;
  control: Control<ProgrammeFormValues>;
  register: UseFormRegister<ProgrammeFormValues>;
  addLabel: string;
}) {
  const { fields, append, remove, move } = useFieldArray({ control, name });
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-1 text-xl font-bold">{legend}</legend>
      {hint ? <p className="text-sm text-ink-soft">{hint}</p> : null}
      <ol className="flex flex-col gap-3">
        {fields.map((field, index) => (
          <li key={field.id} className="flex flex-col gap-2 sm:flex-row sm:items-start">
            <label className="sr-only" htmlFor={`${name}-${field.id}`}>
              {legend}, step {index + 1}
            </label>
            <textarea
              id={`${name}-${field.id}`}
              rows={2}
              className="min-h-12 flex-1 rounded-md border-2 border-line bg-white px-3 py-2"
              {...register(`${name}.${index}.text`)}
            />
            <div className="flex gap-1">
              <Button type="button" variant="quiet" disabled={index === 0} onClick={() => move(index, index - 1)} aria-label={`Move step ${index + 1} up`}>
                ↑
              </Button>
              <Button type="button" variant="quiet" disabled={index === fields.length - 1} onClick={() => move(index, index + 1)} aria-label={`Move step ${index + 1} down`}>
                ↓
              </Button>
              <Button type="button" variant="quiet" onClick={() => remove(index)} aria-label={`Remove step ${index + 1}`}>
                Remove
              </Button>
            </div>
          </li>
        ))}
      </ol>
      <div>
        <Button type="button" variant="secondary" disabled={fields.length >= 20} onClick={() => append({ text: "" })}>
          {addLabel}
        </Button>
      </div>
    </fieldset>
  );
}
