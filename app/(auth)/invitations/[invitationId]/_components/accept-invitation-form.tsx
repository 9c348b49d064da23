"use client";
import { useRouter } from "next/navigation";
import { FormAlert } from "@/components/forms/form-alert";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/text-field";
import { sendJson } from "@/lib/api-client";
import { acceptInvitationSchema } from "@/lib/invitations/schemas";

export function AcceptInvitationForm({ invitationId, suggestedName }: { invitationId: string; suggestedName: string }) {
  const router = useRouter();
  const { form, onSubmit, formError, busy } = useApiForm({
    schema: acceptInvitationSchema,
    defaultValues: { name: suggestedName, password: "", confirmPassword: "" },
    submit: (values) => sendJson("POST", `/api/invitations/${encodeURIComponent(invitationId)}/accept`, values),
    onSuccess: () => {
      router.replace("/home");
      router.refresh();
    },
  });
  const { errors } = form.formState;
  return (
    <form method="post" onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormAlert message={formError} />
      {/* The suggested name is in the server's HTML too, so it shows before the page's scripts have loaded. */}
      <TextField label="Your name" autoComplete="name" defaultValue={suggestedName} {...form.register("name")} error={errors.name?.message} />
      <TextField
        label="Choose a password"
        hint="At least 10 characters. A short sentence is easy to remember and hard to guess."
        type="password"
        autoComplete="new-password"
        {...form.register("password")}
        error={errors.password?.message}
      />
      <TextField
        label="Type it again"
        type="password"
        autoComplete="new-password"
        {...form.register("confirmPassword")}
        error={errors.confirmPassword?.message}
      />
      <Button type="submit" large busy={busy}>
        Accept and continue
      </Button>
    </form>
  );
}
