"use client";
import { useMemo } from "react";
import { useForm, useWatch, type Path } from "react-hook-form";
import { StimPicture } from "@/components/stim-picture";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { analyseChannel } from "@/lib/stim";
import { ContextFields } from "@/components/stim-settings/context-fields";
import { CycleFields, SessionFields } from "@/components/stim-settings/cycle-fields";
import { ElectrodeFields } from "@/components/stim-settings/electrode-fields";
import { PulseFields } from "@/components/stim-settings/pulse-fields";
import { EXAMPLE_VALUES, toChannelInput, unplacedErrors, type SettingsFormValues } from "@/lib/forms/channel-settings-values";

// The form and the picture side by side. Nothing is submitted: every change is analysed in the browser by the
// same pure function the server uses, and the analysis's own field messages are shown on the fields.
export function ExploreWorkbench() {
  const form = useForm<SettingsFormValues>({ defaultValues: EXAMPLE_VALUES });
  const { register, control } = form;
  // Every field is registered with a default and none unregisters, so the watched values are complete.
  const values = useWatch({ control }) as SettingsFormValues;
  const analysis = useMemo(() => analyseChannel(toChannelInput(values)), [values]);
  const errors = analysis.fieldErrors;
  const others = unplacedErrors(errors, values);
  const groups = { register: (name: string) => register(name as Path<SettingsFormValues>), errors, values };
  return (
    <div className="grid gap-10 lg:grid-cols-[minmax(0,5fr)_minmax(0,6fr)]">
      <section aria-labelledby="explore-settings" className="flex flex-col gap-6">
        <div className="flex flex-wrap items-center justify-between gap-3">
          <h2 id="explore-settings" className="text-2xl">
            Settings
          </h2>
          <Button type="button" variant="secondary" onClick={() => form.reset(EXAMPLE_VALUES)}>
            Back to the example
          </Button>
        </div>
        <p className="text-ink-soft">The values filled in are an example starting point, not a recommendation.</p>
        {others.length > 0 ? (
          <Notice tone="blocks" word="Check the settings">
            <ul className="list-disc pl-5">
              {others.map((message) => (
                <li key={message}>{message}</li>
              ))}
            </ul>
          </Notice>
        ) : null}
        <form method="post" noValidate onSubmit={(event) => event.preventDefault()} className="flex flex-col gap-8" aria-label="Channel settings">
          <PulseFields {...groups} />
          <CycleFields {...groups} />
          <SessionFields {...groups} />
          <ElectrodeFields {...groups} />
          <ContextFields {...groups} />
        </form>
      </section>
      {/* Focusable because it scrolls on its own on wide screens, so keyboard users can scroll it too. */}
      <section tabIndex={0} aria-labelledby="explore-picture" className="flex flex-col gap-4 lg:sticky lg:top-4 lg:max-h-[calc(100dvh-2rem)] lg:self-start lg:overflow-y-auto lg:pr-2">
        <h2 id="explore-picture" className="text-2xl">
          What these settings give
        </h2>
        <StimPicture analysis={analysis} />
      </section>
    </div>
  );
}
