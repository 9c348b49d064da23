"use client";
import { useRouter } from "next/navigation";
import { FormAlert } from "@/components/forms/form-alert";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/text-field";
import { sendJson } from "@/lib/api-client";
import { recordClearanceSchema } from "@/lib/screening/clearance-schema";
import type { RedFlagId } from "@/lib/screening/questions";
import { TextAreaField } from "@/components/ui/text-area-field";

// Records that a named clinician (the client's cardiologist, say) has cleared one red flag of one screening.
export function ClearanceForm({ clientId, screeningId, flag, flagLabel }: { clientId: string; screeningId: string; flag: RedFlagId; flagLabel: string }) {
  const router = useRouter();
  const { form, onSubmit, formError, busy } = useApiForm({
    schema: recordClearanceSchema,
    defaultValues: { flag, clinicianName: "", note: "" },
    submit: (values) =>
      sendJson("POST", `/api/clients/${encodeURIComponent(clientId)}/screenings/${encodeURIComponent(screeningId)}/clearances`, values),
    onSuccess: () => router.refresh(),
  });
  const { errors } = form.formState;
  return (
    <form onSubmit={onSubmit} noValidate aria-label={`Clearance for ${flagLabel}`} className="flex flex-col gap-3 rounded-md border border-line p-4">
      <FormAlert message={formError ?? errors.flag?.message ?? null} />
      <input type="hidden" {...form.register("flag")} />
      <TextField
        label="Clinician who gave the clearance"
        hint="Name and role, for example: Dr A. Okafor, cardiologist."
        autoComplete="off"
        {...form.register("clinicianName")}
        error={errors.clinicianName?.message}
      />
      <TextAreaField
        label="What the clearance covers"
        hint="How it was given and any limits, for example: letter of 3 March, forearm stimulation only."
        {...form.register("note")}
        error={errors.note?.message}
      />
      <div>
        <Button type="submit" busy={busy}>
          Record clearance
        </Button>
      </div>
    </form>
  );
}
