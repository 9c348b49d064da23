"use client";
import { useFormContext, useWatch, type Path } from "react-hook-form";
import { ChannelPlacement } from "./channel-placement";
import { ChannelReportPanel } from "./channel-report";
import { Button } from "@/components/ui/button";
import { Choice, SelectField } from "@/components/ui/choice-fields";
import { NumberField } from "@/components/ui/number-field";
import { TextField } from "@/components/ui/text-field";
import { AmplitudeCeilingField, CycleFields } from "@/components/stim-settings/cycle-fields";
import { ElectrodeFields } from "@/components/stim-settings/electrode-fields";
import { PulseFields } from "@/components/stim-settings/pulse-fields";
import type { ChannelReport } from "@/lib/programmes/analyse";
import { TARGET_SUGGESTIONS } from "@/lib/programmes/defaults";
import type { ProgrammeFormValues } from "@/lib/programmes/form-values";
import { ELECTRODE_TYPE_IDS, ELECTRODE_TYPE_LABELS } from "@/lib/programmes/labels";

const TYPE_OPTIONS = ELECTRODE_TYPE_IDS.map((value) => ({ value, label: ELECTRODE_TYPE_LABELS[value] }));

export function ChannelSection({
  index,
  clientId,
  report,
  contentErrors,
  canRemove,
  onRemove,
}: {
  index: number;
  clientId: string;
  report: ChannelReport | undefined;
  contentErrors: Record<string, string>;
  canRemove: boolean;
  onRemove: () => void;
}) {
  const { register, control } = useFormContext<ProgrammeFormValues>();
  const channel = useWatch({ control, name: `channels.${index}` });
  const prefix = `channels.${index}` as const;
  const settingsErrors = report?.analysis.fieldErrors ?? {};
  const fieldError = (path: string) => contentErrors[`${prefix}.${path}`];
  const groups = {
    register: (name: string) => register(`${prefix}.settings.${name}` as Path<ProgrammeFormValues>),
    errors: settingsErrors,
    values: channel.settings,
  };
  const headingId = `channel-${channel.id}-heading`;
  return (
    <section aria-labelledby={headingId} className="rounded-lg border border-line bg-card p-5">
      <div className="mb-4 flex flex-wrap items-center justify-between gap-3">
        <h2 id={headingId} className="text-2xl">
          Channel {index + 1}
          {channel.target ? `: ${channel.target}` : ""}
        </h2>
        {canRemove ? (
          <Button type="button" variant="secondary" onClick={onRemove}>
            Remove channel {index + 1}
          </Button>
        ) : null}
      </div>
      <div className="grid gap-8 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <div className="flex flex-col gap-6">
          <fieldset className="flex flex-col gap-4">
            <legend className="mb-1 text-xl font-bold">Target</legend>
            <TextField
              label="Target muscle or movement"
              list={`targets-${channel.id}`}
              {...register(`${prefix}.target`)}
              error={fieldError("target")}
            />
            <datalist id={`targets-${channel.id}`}>
              {TARGET_SUGGESTIONS.map((suggestion) => (
                <option key={suggestion} value={suggestion} />
              ))}
            </datalist>
            <fieldset>
              <legend className="font-bold">Side</legend>
              <div className="flex gap-4">
                <Choice label="Left" value="left" {...register(`${prefix}.side`)} />
                <Choice label="Right" value="right" {...register(`${prefix}.side`)} />
              </div>
              {fieldError("side") ? <p className="text-sm font-bold text-blocks">{fieldError("side")}</p> : null}
            </fieldset>
            <SelectField label="Electrode type" options={TYPE_OPTIONS} {...register(`${prefix}.electrodeType`)} error={fieldError("electrodeType")} />
          </fieldset>
          <ElectrodeFields {...groups} />
          <NumberField
            label="Spacing between the electrodes (cm, optional)"
            hint="Edge to edge. At least about 3 cm (three finger-widths)."
            {...register(`${prefix}.settings.interElectrodeSpacingCm`)}
            error={settingsErrors.interElectrodeSpacingCm}
          />
          <PulseFields {...groups} />
          <CycleFields {...groups} />
          <AmplitudeCeilingField register={groups.register} errors={settingsErrors} />
        </div>
        <div className="xl:sticky xl:top-4 xl:max-h-[calc(100dvh-2rem)] xl:self-start xl:overflow-y-auto" tabIndex={0} aria-label={`What channel ${index + 1}'s settings give`}>
          <ChannelReportPanel number={index + 1} report={report} />
        </div>
      </div>
      {/* Full width: the outline and its list of electrodes need the room. */}
      <div className="mt-8 border-t border-line pt-6">
        <ChannelPlacement index={index} clientId={clientId} markersError={fieldError("markers")} />
      </div>
    </section>
  );
}
