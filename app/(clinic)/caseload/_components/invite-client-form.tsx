"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { FormAlert } from "@/components/forms/form-alert";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";
import { sendJson } from "@/lib/api-client";
import { inviteClientSchema } from "@/lib/invitations/schemas";

export function InviteClientForm() {
  const router = useRouter();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { form, onSubmit, formError, busy } = useApiForm({
    schema: inviteClientSchema,
    defaultValues: { fullName: "", email: "" },
    submit: (values) => sendJson<{ clientId: string }>("POST", "/api/clients", values),
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
          The client record is created and an e-mail with a link is on its way to {sentTo}.
        </Notice>
      ) : null}
      <FormAlert message={formError} />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Client's full name" autoComplete="off" {...form.register("fullName")} error={errors.fullName?.message} />
        <TextField label="Client's e-mail address" type="email" autoComplete="off" {...form.register("email")} error={errors.email?.message} />
      </div>
      <div>
        <Button type="submit" busy={busy}>
          Create and invite
        </Button>
      </div>
    </form>
  );
}
