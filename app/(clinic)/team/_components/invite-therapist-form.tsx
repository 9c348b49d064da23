"use client";
import { useRouter } from "next/navigation";
import { FormAlert } from "@/components/forms/form-alert";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";
import { sendJson } from "@/lib/api-client";
import { inviteTherapistSchema } from "@/lib/invitations/schemas";
import { useState } from "react";

export function InviteTherapistForm() {
  const router = useRouter();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { form, onSubmit, formError, busy } = useApiForm({
    schema: inviteTherapistSchema,
    defaultValues: { name: "", email: "" },
    submit: (values) => sendJson("POST", "/api/team/invitations", values),
    onSuccess: (_result, values) => {
      setSentTo(values.email);
      form.reset();
      router.refresh();
    },
  });
  const { errors } = form.formState;
  return (
    <form method="post" onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {sentTo ? (
        <Notice tone="ok" word="Invitation sent" role="status">
          An e-mail with a link is on its way to {sentTo}.
        </Notice>
      ) : null}
      <FormAlert message={formError} />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Therapist's name" autoComplete="off" {...form.register("name")} error={errors.name?.message} />
        <TextField label="Work e-mail address" type="email" autoComplete="off" {...form.register("email")} error={errors.email?.message} />
      </div>
      <div>
        <Button type="submit" busy={busy}>
          Send invitation
        </Button>
      </div>
    </form>
  );
}
