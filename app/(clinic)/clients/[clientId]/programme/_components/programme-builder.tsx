"use client";
import { useMemo } from "react";
import { FormProvider, useFieldArray, useForm, useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { analyseProgramme } from "@/lib/programmes/analyse";
import { programmeContentSchema } from "@/lib/programmes/content";
import { STANDARD_CAUTIONS } from "@/lib/programmes/defaults";
import { emptyChannel, formValuesToContentInput, type ProgrammeFormValues } from "@/lib/programmes/form-values";
import { fieldErrorsFrom } from "@/lib/validation";
import { ChannelSection } from "./channel-section";
import { PublishPanel } from "./publish-panel";
import { SaveTemplate } from "./save-template";
import { SaveStatus } from "./save-status";
import { ScheduleSection } from "./schedule-section";
import { StepList } from "./step-list";
import { useDraftAutosave } from "./use-draft-autosave";

export type BuilderProps = {
  clientId: string;
  initialValues: ProgrammeFormValues;
  initialRevision: number;
  // Whether there is a published version yet: a first programme is "early" for the rest-time note.
  hasPublishedVersion: boolean;
  screeningReasons: string[];
  promptedBy?: { type: "check-in" | "flag" | "message"; id: string };
};

export function ProgrammeBuilder({ clientId, initialValues, initialRevision, hasPublishedVersion, screeningReasons, promptedBy }: BuilderProps) {
  const form = useForm<ProgrammeFormValues>({ defaultValues: initialValues });
  const channels = useFieldArray({ control: form.control, name: "channels", keyName: "fieldKey" });
  const values = useWatch({ control: form.control }) as ProgrammeFormValues;
  const initialJson = useMemo(() => JSON.stringify(initialValues), [initialValues]);
  const autosave = useDraftAutosave(clientId, values, initialRevision, initialJson);

  const contentInput = useMemo(() => formValuesToContentInput(values), [values]);
  const reports = useMemo(() => analyseProgramme(contentInput as Parameters<typeof analyseProgramme>[0], { earlyProgramme: !hasPublishedVersion }), [contentInput, hasPublishedVersion]);
  const contentErrors = useMemo(() => {
    const parsed = programmeContentSchema.safeParse(contentInput);
    return parsed.success ? {} : fieldErrorsFrom(parsed.error);
  }, [contentInput]);

  return (
    <FormProvider {...form}>
      <form method="post" noValidate onSubmit={(event) => event.preventDefault()} className="flex flex-col gap-8" aria-label="Programme">
        <div className="sticky top-0 z-10 -mx-5 flex flex-wrap items-center justify-between gap-3 border-b border-line bg-paper/95 px-5 py-3">
          <SaveStatus state={autosave.state} />
          <Button type="button" variant="secondary" onClick={() => void autosave.save()} disabled={autosave.state.kind === "conflict"}>
            Save draft now
          </Button>
        </div>
        {channels.fields.map((field, index) => (
          <ChannelSection
            key={field.fieldKey}
            index={index}
            clientId={clientId}
            report={reports[index]}
            contentErrors={contentErrors}
            canRemove={channels.fields.length > 1}
            onRemove={() => channels.remove(index)}
          />
        ))}
        <div>
          <Button type="button" variant="secondary" disabled={channels.fields.length >= 4} onClick={() => channels.append(emptyChannel(values.channels))}>
            Add a channel{channels.fields.length >= 4 ? " (4 at most)" : ""}
          </Button>
        </div>
        <section className="rounded-lg border border-line bg-card p-5">
          <ScheduleSection register={form.register} errors={contentErrors} />
        </section>
        <section className="flex flex-col gap-8 rounded-lg border border-line bg-card p-5">
          <StepList name="skinPreparation" legend="Skin preparation" hint="Shown to the client before every session." control={form.control} register={form.register} addLabel="Add a step" />
          <StepList name="electrodeCare" legend="Electrode care" hint="Shown after every session." control={form.control} register={form.register} addLabel="Add a step" />
          <div className="flex flex-col gap-3">
            <h3 className="text-xl">Cautions</h3>
            <p className="text-sm text-ink-soft">These standard cautions are always shown to the client and printed on the handout:</p>
            <ul className="list-disc pl-6">
              {STANDARD_CAUTIONS.map((caution) => (
                <li key={caution}>{caution}</li>
              ))}
            </ul>
          </div>
          <StepList name="ownCautions" legend="Your own cautions for this client" control={form.control} register={form.register} addLabel="Add a caution" />
        </section>
        <SaveTemplate />
        <PublishPanel clientId={clientId} autosave={autosave} reports={reports} contentErrors={contentErrors} screeningReasons={screeningReasons} promptedBy={promptedBy} />
      </form>
    </FormProvider>
  );
}
