"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { FormAlert } from "@/components/forms/form-alert";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { FieldError, TextField } from "@/components/ui/text-field";
import { sendJson } from "@/lib/api-client";
import { inviteCarerSchema } from "@/lib/invitations/schemas";

// Used by a client for themselves, and by a therapist recording the client's consent.
export function InviteCarerForm({ clientId, clientName, asTherapist }: { clientId: string; clientName: string; asTherapist: boolean }) {
  const router = useRouter();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { form, onSubmit, formError, busy } = useApiForm({
    schema: inviteCarerSchema,
    defaultValues: {
      carerName: "",
      carerEmail: "",
      relationship: "",
      consentMethod: asTherapist ? "verbal" : "in-app",
      consentNote: "",
      consentConfirmed: false as unknown as true,
    },
    submit: (values) => sendJson("POST", `/api/clients/${encodeURIComponent(clientId)}/carers`, values),
    onSuccess: (_result, values) => {
      setSentTo(values.carerEmail);
      form.reset();
      router.refresh();
    },
  });
  const { errors } = form.formState;
  const consentText = asTherapist
    ? `${clientName} has agreed that this person may see their programme and records and act for them.`
    : "I agree that this person may see my programme and records, log sessions and message my therapist for me.";
  return (
    <form method="post" onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {sentTo ? (
        <Notice tone="ok" word="Invitation sent" role="status">
          An e-mail with a link is on its way to {sentTo}.
        </Notice>
      ) : null}
      <FormAlert message={formError} />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Carer's name" autoComplete="off" {...form.register("carerName")} error={errors.carerName?.message} />
        <TextField label="Carer's e-mail address" type="email" autoComplete="off" {...form.register("carerEmail")} error={errors.carerEmail?.message} />
      </div>
      <TextField
        label="Relationship"
        hint="For example: daughter, husband, support worker."
        autoComplete="off"
        {...form.register("relationship")}
        error={errors.relationship?.message}
      />
      {asTherapist ? (
        <fieldset className="flex flex-col gap-2">
          <legend className="font-bold">How did {clientName} give consent?</legend>
          <label className="flex min-h-11 items-center gap-3">
            <input type="radio" value="verbal" className="size-5" {...form.register("consentMethod")} /> Told me in person or by phone
          </label>
          <label className="flex min-h-11 items-center gap-3">
            <input type="radio" value="written" className="size-5" {...form.register("consentMethod")} /> In writing
          </label>
          {errors.consentMethod?.message ? <FieldError id="consent-method-error" message={errors.consentMethod.message} /> : null}
          <TextField label="Note (optional)" hint="When and how, if useful later." {...form.register("consentNote")} error={errors.consentNote?.message} />
        </fieldset>
      ) : errors.consentMethod?.message ? (
        <FieldError id="consent-method-error" message={errors.consentMethod.message} />
      ) : null}
      <div className="flex flex-col gap-1">
        <label className="flex items-start gap-3">
          <input
            type="checkbox"
            className="mt-1 size-5 shrink-0"
            aria-invalid={errors.consentConfirmed ? true : undefined}
            aria-describedby={errors.consentConfirmed ? "consent-confirmed-error" : undefined}
            {...form.register("consentConfirmed")}
          />
          <span>{consentText}</span>
        </label>
        {errors.consentConfirmed?.message ? <FieldError id="consent-confirmed-error" message={errors.consentConfirmed.message} /> : null}
      </div>
      <div>
        <Button type="submit" busy={busy}>
          Invite carer
        </Button>
      </div>
    </form>
  );
}
