"use client";
import type { UseFormRegister } from "react-hook-form";
import { NumberField } from "@/components/ui/number-field";
import { TextField } from "@/components/ui/text-field";
import type { ProgrammeFormValues } from "@/lib/programmes/form-values";

export function ScheduleSection({ register, errors }: { register: UseFormRegister<ProgrammeFormValues>; errors: Record<string, string> }) {
  return (
    <fieldset className="flex flex-col gap-4">
      <legend className="mb-1 text-xl font-bold">Schedule</legend>
      <p className="text-sm text-ink-soft">Home programmes are usually 30–60 minutes, once or twice a day, 5–7 days a week, for 4–12 weeks.</p>
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
        <NumberField label="Minutes per session" {...register("schedule.minutesPerSession")} error={errors["schedule.minutesPerSession"]} />
        <NumberField label="Sessions per day" {...register("schedule.sessionsPerDay")} error={errors["schedule.sessionsPerDay"]} />
        <NumberField label="Days per week" {...register("schedule.daysPerWeek")} error={errors["schedule.daysPerWeek"]} />
        <NumberField label="Weeks" {...register("schedule.weeks")} error={errors["schedule.weeks"]} />
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Review date" type="date" {...register("schedule.reviewOn")} error={errors["schedule.reviewOn"]} />
        <NumberField
          label="New electrodes after (uses)"
          hint="The client is prompted to open a new pack after this many sessions. Follow the electrode maker's guidance."
          {...register("schedule.replaceElectrodesAfterUses")}
          error={errors["schedule.replaceElectrodesAfterUses"]}
        />
      </div>
    </fieldset>
  );
}
