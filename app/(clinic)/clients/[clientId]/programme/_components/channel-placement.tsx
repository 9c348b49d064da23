"use client";
import { useFormContext, useWatch } from "react-hook-form";
import { BodyOutline } from "@/components/body-outline";
import { PhotoPicker } from "@/components/photos/photo-picker";
import { TextField } from "@/components/ui/text-field";
import type { ProgrammeFormValues } from "@/lib/programmes/form-values";

// Where the two electrodes go: markers on Rampline's body outline, a note in words, and photos taken in clinic.
// The outline lists its own placement checks for the active channel, the same ones that block publishing.
export function ChannelPlacement({ index, clientId, markersError }: { index: number; clientId: string; markersError?: string }) {
  const { register, control, setValue } = useFormContext<ProgrammeFormValues>();
  const channels = useWatch({ control, name: "channels" });
  const channel = channels[index]!;
  return (
    <fieldset className="flex flex-col gap-4">
      <legend className="mb-1 text-xl font-bold">Placement</legend>
      <p className="text-sm text-ink-soft">
        Place electrode A and electrode B on the outline (click or tap, then drag or use the arrow keys). Aim for the
        muscle belly or, better, the motor point.
      </p>
      <BodyOutline
        channels={channels.map((other, position) => ({ id: other.id, label: `Channel ${position + 1}`, index: position, markers: other.markers }))}
        activeChannelId={channel.id}
        onChange={(_channelId, markers) => setValue(`channels.${index}.markers`, markers, { shouldDirty: true })}
      />
      {markersError ? <p className="text-sm font-bold text-blocks">{markersError}</p> : null}
      <TextField
        label="Placement in words (optional)"
        hint="For example: two finger-widths below the elbow crease, on the back of the forearm."
        {...register(`channels.${index}.placementNote`)}
      />
      <PhotoPicker
        clientId={clientId}
        kind="placement"
        label="Placement photos"
        advice="Photograph the electrodes in place, from far enough away to show the whole forearm or shoulder. Avoid faces."
        photoIds={channel.photoIds}
        onChange={(ids) => setValue(`channels.${index}.photoIds`, ids, { shouldDirty: true })}
      />
    </fieldset>
  );
}
