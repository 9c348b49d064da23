"use client";
import { useFormContext } from "react-hook-form";
import { TextField } from "@/components/ui/text-field";
import { CONTEXT_TEXT as T } from "@/lib/screening/field-text";
import { APPLIER_LABELS, SIDE_LABELS } from "@/lib/screening/questions";
import type { ScreeningFormValues } from "@/lib/screening/schema";
import { todayIso } from "@/lib/screening/schema-parts";
import { FormSection } from "./form-section";
import { optionsFrom, RadioGroup } from "./radio-group";
import { useFieldError } from "./use-field-error";

export function ContextSection() {
  const { register } = useFormContext<ScreeningFormValues>();
  const diagnosisError = useFieldError("context.diagnosis");
  const onsetDateError = useFieldError("context.onset.date");
  const timeSinceError = useFieldError("context.onset.timeSince");
  return (
    <FormSection title="A. Context">
      <TextField label={T.diagnosis.ask} hint={T.diagnosis.hint} autoComplete="off" {...register("context.diagnosis")} error={diagnosisError} />
      <RadioGroup name="context.affectedSide" legend={T.affectedSide.ask} options={optionsFrom(SIDE_LABELS)} inline />
      <fieldset className="flex flex-col gap-3">
        <legend className="font-bold">{T.onset.ask}</legend>
        <p className="text-sm text-ink-soft">{T.onset.hint}</p>
        <div className="grid gap-4 sm:grid-cols-2">
          <TextField label={T.onsetDate.ask} type="date" max={todayIso()} {...register("context.onset.date")} error={onsetDateError} />
          <TextField label={T.timeSince.ask} hint={T.timeSince.hint} autoComplete="off" {...register("context.onset.timeSince")} error={timeSinceError} />
        </div>
      </fieldset>
      <RadioGroup name="context.appliedBy" legend={T.appliedBy.ask} options={optionsFrom(APPLIER_LABELS)} />
      <RadioGroup name="context.carerPresent" legend={T.carerPresent.ask} inline />
    </FormSection>
  );
}
