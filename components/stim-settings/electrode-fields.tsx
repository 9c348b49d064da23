import { SelectField } from "@/components/ui/choice-fields";
import type { FieldGroupProps } from "./field-props";
import { NumberField } from "@/components/ui/number-field";

const SHAPES = [
  { value: "round", label: "Round" },
  { value: "square", label: "Square" },
  { value: "rectangle", label: "Rectangle" },
] as const;
const UNITS = [
  { value: "cm", label: "cm" },
  { value: "in", label: "in (inches)" },
] as const;

function ElectrodeFieldset({ index, register, errors, values }: FieldGroupProps & { index: 0 | 1 }) {
  const shape = values.electrodes[index].shape;
  const path = `electrodes.${index}` as const;
  const error = (key: string) => errors[`${path}.${key}`];
  return (
    <fieldset className="flex flex-col gap-3 rounded-md border border-line p-4">
      <legend className="px-1 font-bold">Electrode {index + 1}</legend>
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField label="Shape" options={SHAPES} {...register(`${path}.shape`)} error={error("shape")} />
        <SelectField label="Unit" options={UNITS} {...register(`${path}.unit`)} error={error("unit")} />
        {shape === "round" ? <NumberField label="Diameter" {...register(`${path}.diameter`)} error={error("diameter")} /> : null}
        {shape === "square" ? <NumberField label="Side" {...register(`${path}.side`)} error={error("side")} /> : null}
        {shape === "rectangle" ? (
          <>
            <NumberField label="Width" {...register(`${path}.width`)} error={error("width")} />
            <NumberField label="Length" {...register(`${path}.length`)} error={error("length")} />
          </>
        ) : null}
      </div>
    </fieldset>
  );
}

export function ElectrodeFields(props: FieldGroupProps) {
  return (
    <fieldset className="flex flex-col gap-4">
      <legend className="mb-2 text-xl font-bold">Electrodes</legend>
      <p className="text-sm text-ink-soft">The size of the conductive area, not the backing. The two may differ.</p>
      <ElectrodeFieldset index={0} {...props} />
      <ElectrodeFieldset index={1} {...props} />
    </fieldset>
  );
}
