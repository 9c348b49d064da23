"use client";
import { FormAlert } from "@/components/forms/form-alert";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";
import { ApiError } from "@/lib/api-client";
import { authClient } from "@/lib/auth/client";
import { forgotPasswordSchema } from "@/lib/invitations/schemas";

export function ForgotPasswordForm() {
  const { form, onSubmit, formError, busy, succeeded } = useApiForm({
    schema: forgotPasswordSchema,
    defaultValues: { email: "" },
    submit: async ({ email }) => {
      const { error } = await authClient.requestPasswordReset({ email, redirectTo: "/reset-password" });
      if (error?.status === 429) throw new ApiError(429, "RATE_LIMITED", "Too many requests. Wait a few minutes, then try again.");
      if (error) throw new ApiError(error.status, "INTERNAL", "The request did not go through. Please try again.");
    },
  });
  if (succeeded) {
    // The same answer whether or not the address has an account, so the form cannot be used to find accounts.
    return (
      <Notice tone="ok" word="Check your e-mail" role="status">
        If {form.getValues("email")} belongs to a Rampline account, a link to choose a new password is on its way. It
        works for one hour.
      </Notice>
    );
  }
  return (
    <form method="post" onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormAlert message={formError} />
      <TextField label="E-mail address" type="email" autoComplete="email" {...form.register("email")} error={form.formState.errors.email?.message} />
      <Button type="submit" large busy={busy}>
        Send the link
      </Button>
    </form>
  );
}
