import type { FieldGroupProps } from "./field-props";
import { NumberField } from "@/components/ui/number-field";

export function CycleFields({ register, errors }: Omit<FieldGroupProps, "values">) {
  return (
    <fieldset className="flex flex-col gap-4">
      <legend className="mb-2 text-xl font-bold">Cycle</legend>
      <div className="grid gap-4 sm:grid-cols-2">
        <NumberField label="Ramp-up (s)" {...register("rampUpS")} error={errors.rampUpS} />
        <NumberField label="Hold (s)" hint="Time at the set amplitude, ramps not included." {...register("holdS")} error={errors.holdS} />
        <NumberField label="Ramp-down (s)" {...register("rampDownS")} error={errors.rampDownS} />
        <NumberField label="Rest (s)" hint="0 for continuous stimulation." {...register("restS")} error={errors.restS} />
      </div>
    </fieldset>
  );
}

export function AmplitudeCeilingField({ register, errors }: Omit<FieldGroupProps, "values">) {
  return (
    <NumberField
      label="Amplitude ceiling (mA)"
      hint="The most the client may turn up to; the figures are worked out at this level. On the device the amplitude always starts from zero and goes up slowly."
      {...register("amplitudeCeilingMa")}
      error={errors.amplitudeCeilingMa}
    />
  );
}

export function SessionFields({ register, errors }: Omit<FieldGroupProps, "values">) {
  return (
    <fieldset className="flex flex-col gap-4">
      <legend className="mb-2 text-xl font-bold">Amplitude and sessions</legend>
      <AmplitudeCeilingField register={register} errors={errors} />
      <div className="grid gap-4 sm:grid-cols-3">
        <NumberField label="Session (minutes)" {...register("sessionMinutes")} error={errors.sessionMinutes} />
        <NumberField label="Sessions per day" inputMode="numeric" step={1} {...register("sessionsPerDay")} error={errors.sessionsPerDay} />
        <NumberField label="Days per week" inputMode="numeric" step={1} {...register("daysPerWeek")} error={errors.daysPerWeek} />
      </div>
    </fieldset>
  );
}
