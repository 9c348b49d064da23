"use client";
import { useFormContext } from "react-hook-form";
import { TextAreaField } from "@/components/ui/text-area-field";
import { TextField } from "@/components/ui/text-field";
import { OUTCOME_TEXT as T } from "@/lib/screening/field-text";
import { OUTCOME_LABELS } from "@/lib/screening/questions";
import type { ScreeningFormValues } from "@/lib/screening/schema";
import { FormSection } from "./form-section";
import { optionsFrom, RadioGroup } from "./radio-group";
import { useFieldError } from "./use-field-error";

export function OutcomeSection() {
  const { register } = useFormContext<ScreeningFormValues>();
  const rescreenError = useFieldError("outcome.rescreenOn");
  const notesError = useFieldError("outcome.notes");
  return (
    <FormSection title="F. Outcome" intro="Your decision as the treating clinician. The reviewer and the date are yours and now, when you sign.">
      <RadioGroup name="outcome.result" legend={T.result.ask} options={optionsFrom(OUTCOME_LABELS)} />
      <TextField label={T.rescreenOn.ask} hint={T.rescreenOn.hint} type="date" className="sm:max-w-xs" {...register("outcome.rescreenOn")} error={rescreenError} />
      <TextAreaField label={T.notes.ask} hint={T.notes.hint} rows={4} {...register("outcome.notes")} error={notesError} />
    </FormSection>
  );
}
