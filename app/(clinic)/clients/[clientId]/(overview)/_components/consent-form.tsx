"use client";
import { useRouter } from "next/navigation";
import { FormAlert } from "@/components/forms/form-alert";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button } from "@/components/ui/button";
import { Choice, SelectField } from "@/components/ui/choice-fields";
import { TextField } from "@/components/ui/text-field";
import { sendJson } from "@/lib/api-client";
import { CONSENT_LABELS, recordConsentSchema } from "@/lib/clients/schemas";

const KIND_OPTIONS = Object.entries(CONSENT_LABELS).map(([value, label]) => ({ value, label }));

// A therapist records a consent as the client gave it, or its withdrawal; each is a new entry in the history.
export function ConsentForm({ clientId }: { clientId: string }) {
  const router = useRouter();
  const { form, onSubmit, formError, busy } = useApiForm({
    schema: recordConsentSchema,
    defaultValues: { kind: "treatment", status: "given", method: "verbal", note: "" },
    submit: (values) => sendJson("POST", `/api/clients/${encodeURIComponent(clientId)}/consents`, values),
    onSuccess: () => {
      form.reset();
      router.refresh();
    },
  });
  return (
    <form method="post" onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormAlert message={formError} />
      <SelectField label="Consent to" options={KIND_OPTIONS} {...form.register("kind")} />
      <fieldset>
        <legend className="font-bold">The client has</legend>
        <div className="flex flex-wrap gap-4">
          <Choice label="Given consent" value="given" {...form.register("status")} />
          <Choice label="Withdrawn consent" value="withdrawn" {...form.register("status")} />
        </div>
      </fieldset>
      <fieldset>
        <legend className="font-bold">How</legend>
        <div className="flex flex-wrap gap-4">
          <Choice label="In person or by phone" value="verbal" {...form.register("method")} />
          <Choice label="In writing" value="written" {...form.register("method")} />
        </div>
        {form.formState.errors.method?.message ? <p className="text-sm font-bold text-blocks">{form.formState.errors.method.message}</p> : null}
      </fieldset>
      <TextField label="Note (optional)" {...form.register("note")} error={form.formState.errors.note?.message} />
      <div>
        <Button type="submit" busy={busy}>
          Record consent
        </Button>
      </div>
    </form>
  );
}
