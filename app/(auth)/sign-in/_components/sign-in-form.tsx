"use client";
import { useRouter } from "next/navigation";
import { FormAlert } from "@/components/forms/form-alert";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";
import { ApiError } from "@/lib/api-client";
import { authClient } from "@/lib/auth/client";
import { signInSchema } from "@/lib/invitations/schemas";

// better-auth's messages are replaced with Rampline's own, and never say whether the e-mail address exists.
function messageFor(status: number, code?: string): string {
  if (status === 429) return "Too many sign-in attempts. Wait a minute, then try again.";
  if (code === "BANNED_USER" || status === 403) return "This account has been deactivated. Contact your clinic.";
  if (status === 401) return "That e-mail address and password do not match. Check them and try again.";
  return "Signing in did not work. Please try again.";
}

export function SignInForm({ passwordWasReset }: { passwordWasReset: boolean }) {
  const router = useRouter();
  const { form, onSubmit, formError, busy } = useApiForm({
    schema: signInSchema,
    defaultValues: { email: "", password: "" },
    submit: async (values) => {
      const { error } = await authClient.signIn.email({ email: values.email, password: values.password });
      if (error) throw new ApiError(error.status, "UNAUTHENTICATED", messageFor(error.status, error.code));
    },
    onSuccess: () => {
      router.replace("/home");
      router.refresh();
    },
  });
  const { errors } = form.formState;
  return (
    <form method="post" onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {passwordWasReset ? (
        <Notice tone="ok" word="Password changed" role="status">
          Sign in with your new password.
        </Notice>
      ) : null}
      <FormAlert message={formError} word="Not signed in" />
      <TextField label="E-mail address" type="email" autoComplete="email" {...form.register("email")} error={errors.email?.message} />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        {...form.register("password")}
        error={errors.password?.message}
      />
      <Button type="submit" large busy={busy}>
        Sign in
      </Button>
    </form>
  );
}
