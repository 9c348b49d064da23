import { Choice } from "@/components/ui/choice-fields";
import type { FieldGroupProps } from "./field-props";
import { NumberField } from "@/components/ui/number-field";

const WAVEFORMS = [
  { value: "symmetric-biphasic", label: "Symmetric biphasic", hint: "Two equal phases of opposite sign." },
  { value: "asymmetric-balanced-biphasic", label: "Asymmetric balanced biphasic", hint: "A second phase of lower amplitude and longer duration, carrying the same charge back." },
  { value: "monophasic", label: "Monophasic", hint: "One phase, always the same direction." },
] as const;

export function PulseFields({ register, errors, values }: FieldGroupProps) {
  const kind = values.waveform.kind;
  return (
    <fieldset className="flex flex-col gap-4">
      <legend className="mb-2 text-xl font-bold">Pulse</legend>
      <div className="grid gap-4 sm:grid-cols-2">
        <NumberField label="Frequency (Hz)" {...register("frequencyHz")} error={errors.frequencyHz} />
        <NumberField
          label="Phase duration (µs)"
          hint="Also called pulse duration; the first phase for an asymmetric waveform."
          {...register("phaseDurationUs")}
          error={errors.phaseDurationUs}
        />
      </div>
      <fieldset>
        <legend className="font-bold">Waveform</legend>
        {WAVEFORMS.map((w) => (
          <Choice key={w.value} label={w.label} hint={w.hint} value={w.value} {...register("waveform.kind")} />
        ))}
      </fieldset>
      {kind === "asymmetric-balanced-biphasic" ? (
        <div className="grid gap-4 sm:grid-cols-2">
          <NumberField
            label="Second phase amplitude (mA)"
            hint="Its value when the first phase is at the amplitude ceiling."
            {...register("waveform.secondPhaseAmplitudeMa")}
            error={errors["waveform.secondPhaseAmplitudeMa"]}
          />
          <NumberField
            label="Second phase duration (µs)"
            hint="Balanced when amplitude × duration matches the first phase."
            {...register("waveform.secondPhaseDurationUs")}
            error={errors["waveform.secondPhaseDurationUs"]}
          />
        </div>
      ) : null}
      {kind !== "monophasic" ? (
        <NumberField
          label="Interphase gap (µs, optional)"
          hint="Leave blank if the device has none."
          {...register("waveform.interphaseGapUs")}
          error={errors["waveform.interphaseGapUs"]}
        />
      ) : null}
    </fieldset>
  );
}
