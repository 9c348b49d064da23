import { Choice, SelectField } from "@/components/ui/choice-fields";
import type { FieldGroupProps } from "./field-props";
import { NumberField } from "@/components/ui/number-field";

const REGIONS = [
  { value: "", label: "Not given" },
  { value: "hand-wrist", label: "Hand and wrist" },
  { value: "forearm", label: "Forearm" },
  { value: "upper-arm", label: "Upper arm" },
  { value: "shoulder", label: "Shoulder" },
  { value: "other", label: "Other" },
] as const;

export function ContextFields({ register, errors }: Omit<FieldGroupProps, "values">) {
  return (
    <fieldset className="flex flex-col gap-4">
      <legend className="mb-2 text-xl font-bold">Placement and programme</legend>
      <NumberField
        label="Spacing between the electrodes (cm, optional)"
        hint="Edge to edge, if measured."
        {...register("interElectrodeSpacingCm")}
        error={errors.interElectrodeSpacingCm}
      />
      <SelectField label="Body region" options={REGIONS} {...register("bodyRegion")} error={errors.bodyRegion} />
      <Choice type="checkbox" label="Early in the programme" hint="The first weeks, while endurance builds." {...register("earlyProgramme")} />
    </fieldset>
  );
}
