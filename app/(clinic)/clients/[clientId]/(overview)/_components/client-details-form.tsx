"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { FormAlert } from "@/components/forms/form-alert";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button } from "@/components/ui/button";
import { Choice } from "@/components/ui/choice-fields";
import { Notice } from "@/components/ui/notice";
import { TextAreaField } from "@/components/ui/text-area-field";
import { TextField } from "@/components/ui/text-field";
import { sendJson } from "@/lib/api-client";
import { clientDetailsSchema } from "@/lib/clients/schemas";

type Details = { condition: string | null; affectedSide: "left" | "right" | "both" | null; goals: string | null; onsetDate: string | null };

export function ClientDetailsForm({ clientId, details, canEdit }: { clientId: string; details: Details; canEdit: boolean }) {
  const router = useRouter();
  const [saved, setSaved] = useState(false);
  const { form, onSubmit, formError, busy } = useApiForm({
    schema: clientDetailsSchema,
    defaultValues: { condition: details.condition ?? "", affectedSide: details.affectedSide, goals: details.goals ?? "", onsetDate: details.onsetDate ?? "" },
    submit: (values) => sendJson("PATCH", `/api/clients/${encodeURIComponent(clientId)}`, values),
    onSuccess: () => {
      setSaved(true);
      router.refresh();
    },
  });
  const { errors } = form.formState;
  return (
    <form method="post" onSubmit={onSubmit} noValidate className="flex flex-col gap-4" onChange={() => setSaved(false)}>
      {saved ? (
        <Notice tone="ok" word="Saved" role="status">
          The changes are in the record and the audit trail.
        </Notice>
      ) : null}
      <FormAlert message={formError} />
      <fieldset disabled={!canEdit} className="flex flex-col gap-4">
        <TextField label="Condition" hint="For example: left middle cerebral artery stroke." {...form.register("condition")} error={errors.condition?.message} />
        <fieldset>
          <legend className="font-bold">Affected side</legend>
          <div className="flex flex-wrap gap-4">
            <Choice label="Left" value="left" {...form.register("affectedSide")} />
            <Choice label="Right" value="right" {...form.register("affectedSide")} />
            <Choice label="Both" value="both" {...form.register("affectedSide")} />
          </div>
        </fieldset>
        <TextField label="Date of onset" type="date" className="sm:max-w-xs" {...form.register("onsetDate")} error={errors.onsetDate?.message} />
        <TextAreaField label="Goals" {...form.register("goals")} error={errors.goals?.message} />
      </fieldset>
      {canEdit ? (
        <div>
          <Button type="submit" busy={busy}>
            Save details
          </Button>
        </div>
      ) : null}
    </form>
  );
}
