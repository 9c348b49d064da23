"use client";
import { useWatch, type UseFormReturn } from "react-hook-form";
import { PhotoPicker } from "@/components/photos/photo-picker";
import { FieldError } from "@/components/ui/text-field";
import { Choice } from "@/components/ui/choice-fields";
import type { CheckInInput } from "@/lib/check-ins/schema";
import { SKIN_LEVELS, SKIN_SCALE } from "@/lib/check-ins/skin-scale";
import type { CheckInChannel } from "./check-in-form";

// One skin check per electrode, on the five-level scale in plain words, with a photo when there is any change.
export function SkinCheck({ clientId, channels, form }: { clientId: string; channels: CheckInChannel[]; form: UseFormReturn<CheckInInput, unknown, unknown> }) {
  const skin = useWatch({ control: form.control, name: "skin" });
  const errors = form.formState.errors.skin;
  let index = -1;
  return (
    <fieldset className="flex flex-col gap-6">
      <legend className="mb-1 text-2xl font-bold">Skin check</legend>
      <p className="text-ink-soft">Look at the skin under each electrode now, after taking the electrodes off.</p>
      {channels.flatMap((channel) =>
        (["A", "B"] as const).map((electrode, e) => {
          index += 1;
          const i = index;
          const level = Number(skin?.[i]?.level);
          const legend = `Channel ${channel.number}, electrode ${electrode}: ${channel.electrodes[e]}`;
          const error = errors?.[i]?.level?.message;
          return (
            <fieldset key={`${channel.id}-${electrode}`} className="flex flex-col gap-1 rounded-lg border border-line bg-card p-4" aria-describedby={error ? `skin-${i}-error` : undefined}>
              <legend className="px-1 text-lg font-bold">{legend}</legend>
              {SKIN_LEVELS.map((n) => (
                <Choice key={n} label={SKIN_SCALE[n].words} hint={SKIN_SCALE[n].hint} value={n} {...form.register(`skin.${i}.level`)} />
              ))}
              {error ? <FieldError id={`skin-${i}-error`} message={error} /> : null}
              {level >= 2 ? (
                <div className="mt-2 flex flex-col gap-2 border-t border-line-soft pt-3">
                  <Choice type="checkbox" label="It spreads beyond the electrode's outline" {...form.register(`skin.${i}.spreads`)} />
                  <Choice type="checkbox" label="It itches" {...form.register(`skin.${i}.itch`)} />
                  <PhotoPicker
                    clientId={clientId}
                    kind="skin"
                    max={3}
                    label="Photo of the skin (optional, helps your therapist)"
                    advice="In daylight if you can, close enough to fill the picture with the area, with the electrode outline in view. No faces."
                    photoIds={skin?.[i]?.photoIds ?? []}
                    onChange={(ids) => form.setValue(`skin.${i}.photoIds`, ids, { shouldDirty: true })}
                  />
                </div>
              ) : null}
            </fieldset>
          );
        }),
      )}
      {errors?.message ? <FieldError id="skin-error" message={errors.message} /> : null}
    </fieldset>
  );
}
