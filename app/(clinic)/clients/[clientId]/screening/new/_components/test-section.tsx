"use client";
import { useFormContext, useWatch } from "react-hook-form";
import { TextAreaField } from "@/components/ui/text-area-field";
import { TEST_TEXT as T } from "@/lib/screening/field-text";
import { MOVEMENT_LABELS, SKIN_AFTER_LABELS, TOLERANCE_LABELS } from "@/lib/screening/questions";
import type { ScreeningFormValues } from "@/lib/screening/schema";
import { FormSection } from "./form-section";
import { optionsFrom, RadioGroup } from "./radio-group";
import { useFieldError } from "./use-field-error";

export function TestSection() {
  const { control, register } = useFormContext<ScreeningFormValues>();
  const done = useWatch({ control, name: "testStimulation.done" });
  const reasonError = useFieldError("testStimulation.notDoneReason");
  return (
    <FormSection title="E. Test stimulation in clinic">
      <RadioGroup name="testStimulation.done" legend={T.done.ask} inline />
      {done === "yes" ? (
        <>
          <RadioGroup name="testStimulation.tolerance" legend={T.tolerance.ask} options={optionsFrom(TOLERANCE_LABELS)} />
          <RadioGroup name="testStimulation.movement" legend={T.movement.ask} options={optionsFrom(MOVEMENT_LABELS)} />
          <RadioGroup name="testStimulation.skinAfter" legend={T.skinAfter.ask} options={optionsFrom(SKIN_AFTER_LABELS)} />
        </>
      ) : null}
      {done === "no" ? <TextAreaField label={T.notDoneReason.ask} {...register("testStimulation.notDoneReason")} error={reasonError} /> : null}
    </FormSection>
  );
}
