"use client";
import { useFieldArray, useFormContext } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { FieldError } from "@/components/ui/text-field";
import { MAX_SITES } from "@/lib/screening/questions";
import type { ScreeningFormValues } from "@/lib/screening/schema";
import { emptySite } from "./form-defaults";
import { FormSection } from "./form-section";
import { SiteFields } from "./site-fields";
import { useFieldError } from "./use-field-error";

export function SitesSection() {
  const { control } = useFormContext<ScreeningFormValues>();
  const { fields, append, remove } = useFieldArray({ control, name: "sites" });
  // A problem with the list as a whole (none, or too many) sits on "sites" or, after a server reply, "sites.root".
  const listMessage = useFieldError("sites");
  const rootMessage = useFieldError("sites.root");
  const listError = listMessage ?? rootMessage;
  return (
    <FormSection title="C. Electrode sites" intro={`Each place electrodes may go, from 1 to ${MAX_SITES}.`}>
      {fields.map((field, index) => (
        <SiteFields key={field.id} index={index} canRemove={fields.length > 1} onRemove={() => remove(index)} />
      ))}
      {listError ? <FieldError id="sites-error" message={listError} /> : null}
      <div>
        <Button type="button" variant="secondary" disabled={fields.length >= MAX_SITES} onClick={() => append(emptySite() as ScreeningFormValues["sites"][number])}>
          Add another electrode site
        </Button>
        {fields.length >= MAX_SITES ? <p className="mt-1 text-sm text-ink-soft">A screening holds at most {MAX_SITES} sites.</p> : null}
      </div>
    </FormSection>
  );
}
