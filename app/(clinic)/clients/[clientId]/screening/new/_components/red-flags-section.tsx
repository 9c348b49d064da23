"use client";
import { RED_FLAGS } from "@/lib/screening/questions";
import { FormSection } from "./form-section";
import { RadioGroup } from "./radio-group";

export function RedFlagsSection() {
  return (
    <FormSection
      title="B. Systemic red flags"
      intro="Each “yes” holds up publishing until you record the clearance of a named clinician, for example the client's cardiologist."
    >
      {RED_FLAGS.map((flag) => (
        <RadioGroup key={flag.id} name={`redFlags.${flag.key}`} legend={flag.question} inline />
      ))}
    </FormSection>
  );
}
