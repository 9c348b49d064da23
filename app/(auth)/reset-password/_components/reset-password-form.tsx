"use client";
import { useRouter } from "next/navigation";
import { FormAlert } from "@/components/forms/form-alert";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/text-field";
import { ApiError } from "@/lib/api-client";
import { authClient } from "@/lib/auth/client";
import { resetPasswordSchema } from "@/lib/invitations/schemas";

export function ResetPasswordForm({ token }: { token: string }) {
  const router = useRouter();
  const { form, onSubmit, formError, busy } = useApiForm({
    schema: resetPasswordSchema,
    defaultValues: { password: "", confirmPassword: "" },
    submit: async ({ password }) => {
      const { error } = await authClient.resetPassword({ newPassword: password, token });
      if (error) {
        throw new ApiError(
          error.status,
          "BAD_REQUEST",
          error.status === 429
            ? "Too many attempts. Wait a few minutes, then try again."
            : "This link has expired or has already been used. Ask for a new one from the sign-in page.",
        );
      }
    },
    onSuccess: () => router.replace("/sign-in?reset=done"),
  });
  const { errors } = form.formState;
  return (
    <form method="post" onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormAlert message={formError} />
      <TextField
        label="New password"
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
        Save the new password
      </Button>
    </form>
  );
}
