"use client";
import { useState } from "react";
import { FormAlert } from "@/components/forms/form-alert";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button } from "@/components/ui/button";
import { TextAreaField } from "@/components/ui/text-area-field";
import { FieldError, TextField } from "@/components/ui/text-field";
import { sendJson } from "@/lib/api-client";
import { checkInSchema } from "@/lib/check-ins/schema";
import { ChoiceGroup } from "./choice-group";
import { CheckInResult, type SavedCheckIn } from "./check-in-result";
import { ComfortScale } from "./comfort-scale";
import { SkinCheck } from "./skin-check";

export type CheckInChannel = { id: string; number: number; target: string; ceilingMa: number; electrodes: [string, string] };

const asNumber = (value: unknown) => (value === "" || value === null || value === undefined ? undefined : Number(value));

export function CheckInForm({ clientId, today, defaultMinutes, channels, clinicPhone, versionNumber, versionChoice }: {
  clientId: string;
  today: string;
  defaultMinutes: number;
  channels: CheckInChannel[];
  clinicPhone: string | null;
  versionNumber: number;
  versionChoice: { current: number; previous: number } | null;
}) {
  const [saved, setSaved] = useState<SavedCheckIn | null>(null);
  const { form, onSubmit, formError, busy } = useApiForm({
    schema: checkInSchema,
    defaultValues: {
      sessionDate: today,
      minutes: defaultMinutes,
      versionNumber: versionChoice ? (undefined as unknown as number) : versionNumber,
      channels: channels.map((channel) => ({ channelId: channel.id, amplitudeMa: undefined as unknown as number })),
      skin: channels.flatMap((channel) => (["A", "B"] as const).map((electrode) => ({ channelId: channel.id, electrode, level: undefined as unknown as number, spreads: false, itch: false, photoIds: [] }))),
      electrodeCondition: "fine",
      notes: "",
    },
    submit: (values) => sendJson<SavedCheckIn>("POST", `/api/clients/${encodeURIComponent(clientId)}/check-ins`, values),
    onSuccess: (result) => setSaved(result),
  });
  const { errors } = form.formState;
  if (saved) return <CheckInResult saved={saved} clinicPhone={clinicPhone} />;
  return (
    <form method="post" onSubmit={onSubmit} noValidate className="flex flex-col gap-8" aria-label="Session log">
      <FormAlert message={formError} />
      {versionChoice ? (
        <ChoiceGroup
          legend="Which settings was your stimulator set to?"
          hint="Your therapist changed the programme and nobody has confirmed the stimulator was changed to match yet."
          options={[
            { value: String(versionChoice.current), label: `The new settings (version ${versionChoice.current})` },
            { value: String(versionChoice.previous), label: `The settings before (version ${versionChoice.previous})` },
          ]}
          registration={form.register("versionNumber")}
          error={errors.versionNumber?.message}
        />
      ) : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Day of the session" type="date" max={today} {...form.register("sessionDate")} error={errors.sessionDate?.message} />
        <TextField label="Minutes done" type="number" inputMode="numeric" min={1} {...form.register("minutes", { setValueAs: asNumber })} error={errors.minutes?.message} />
      </div>
      <fieldset className="flex flex-col gap-4">
        <legend className="mb-1 text-2xl font-bold">Strength reached</legend>
        {channels.map((channel, index) => (
          <TextField
            key={channel.id}
            label={`Channel ${channel.number} (${channel.target}), in mA`}
            hint={`The highest strength you turned up to. Your therapist's limit is ${channel.ceilingMa} mA.`}
            type="number"
            inputMode="decimal"
            step="any"
            {...form.register(`channels.${index}.amplitudeMa`, { setValueAs: asNumber })}
            error={errors.channels?.[index]?.amplitudeMa?.message}
          />
        ))}
        {errors.channels?.message ? <FieldError id="channels-error" message={errors.channels.message} /> : null}
      </fieldset>
      <ComfortScale register={form.register} error={errors.comfort?.message} />
      <ChoiceGroup
        legend="Movement you saw"
        options={[
          { value: "full", label: "Full movement" },
          { value: "partial", label: "Some movement" },
          { value: "none", label: "No movement" },
        ]}
        registration={form.register("movement")}
        error={errors.movement?.message}
      />
      <ChoiceGroup
        legend="How tired the muscles felt afterwards"
        options={[
          { value: "none", label: "Not tired" },
          { value: "mild", label: "A little tired" },
          { value: "moderate", label: "Quite tired" },
          { value: "severe", label: "Very tired" },
        ]}
        registration={form.register("fatigue")}
        error={errors.fatigue?.message}
      />
      <SkinCheck clientId={clientId} channels={channels} form={form} />
      <ChoiceGroup
        legend="How the electrodes stuck"
        options={[
          { value: "fine", label: "Fine, flat all the way round" },
          { value: "edges-lifting", label: "Edges lifting" },
          { value: "poor-sticking", label: "Not sticking well" },
        ]}
        registration={form.register("electrodeCondition")}
        error={errors.electrodeCondition?.message}
      />
      <TextAreaField label="Anything else for your therapist (optional)" {...form.register("notes")} error={errors.notes?.message} />
      <Button type="submit" large busy={busy}>
        Save this session
      </Button>
    </form>
  );
}
