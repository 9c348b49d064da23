"use client";
import { useFormContext, useWatch } from "react-hook-form";
import { TextAreaField } from "@/components/ui/text-area-field";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/text-field";
import { SITE_TEXT as T } from "@/lib/screening/field-text";
import { SENSATION_METHOD_LABELS, SENSATION_RESULT_LABELS } from "@/lib/screening/questions";
import type { ScreeningFormValues } from "@/lib/screening/schema";
import { optionsFrom, RadioGroup } from "./radio-group";
import { useFieldError } from "./use-field-error";

const TISSUE_QUESTIONS = ["clotHistory", "malignancyOrRadiotherapy", "recentFractureOrSurgery", "swelling", "metalwork", "clearOfNeckAndChest"] as const;

// One electrode site (section C): where the electrodes would go and what the skin and tissue there are like.
export function SiteFields({ index, canRemove, onRemove }: { index: number; canRemove: boolean; onRemove: () => void }) {
  const { control, register } = useFormContext<ScreeningFormValues>();
  const name = useWatch({ control, name: `sites.${index}.name` });
  const nameError = useFieldError(`sites.${index}.name`);
  const notesError = useFieldError(`sites.${index}.notes`);
  const title = `Site ${index + 1}${name?.trim() ? `: ${name.trim()}` : ""}`;
  return (
    <fieldset className="flex flex-col gap-4 rounded-md border-2 border-line p-4">
      <legend className="px-1 text-lg font-bold">{title}</legend>
      <TextField label={T.name.ask} hint={T.name.hint} autoComplete="off" {...register(`sites.${index}.name`)} error={nameError} />
      <RadioGroup name={`sites.${index}.skinIntact`} legend={T.skinIntact.ask} inline />
      <div className="grid gap-4 sm:grid-cols-2">
        <RadioGroup name={`sites.${index}.sensationMethod`} legend={T.sensationMethod.ask} options={optionsFrom(SENSATION_METHOD_LABELS)} />
        <RadioGroup name={`sites.${index}.sensationResult`} legend={T.sensationResult.ask} options={optionsFrom(SENSATION_RESULT_LABELS)} />
      </div>
      {TISSUE_QUESTIONS.map((key) => (
        <RadioGroup key={key} name={`sites.${index}.${key}`} legend={T[key].ask} hint={key === "metalwork" ? "Recorded for information only." : undefined} inline />
      ))}
      <TextAreaField label={T.notes.ask} rows={2} {...register(`sites.${index}.notes`)} error={notesError} />
      {canRemove ? (
        <div>
          <Button type="button" variant="secondary" onClick={onRemove}>
            Remove site {index + 1}
          </Button>
        </div>
      ) : null}
    </fieldset>
  );
}
