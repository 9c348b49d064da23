"use client";
import { CAPACITY_TEXT as T } from "@/lib/screening/field-text";
import { CARER_COMPETENCE_LABELS } from "@/lib/screening/questions";
import { FormSection } from "./form-section";
import { optionsFrom, RadioGroup } from "./radio-group";

export function CapacitySection() {
  return (
    <FormSection title="D. Capacity to self-manage">
      <RadioGroup name="capacity.understanding" legend={T.understanding.ask} inline />
      <RadioGroup name="capacity.dexterity" legend={T.dexterity.ask} inline />
      <RadioGroup name="capacity.carerCompetence" legend={T.carerCompetence.ask} options={optionsFrom(CARER_COMPETENCE_LABELS)} />
    </FormSection>
  );
}
