import type { Metadata } from "next";
import Link from "next/link";
import { ForgotPasswordForm } from "./_components/forgot-password-form";

export const metadata: Metadata = { title: "Forgotten password" };

export default function ForgotPasswordPage() {
  return (
    <>
      <h1 className="text-2xl">Forgotten your password?</h1>
      <p className="mt-2 text-ink-soft">
        Enter the e-mail address you sign in with. If it belongs to a Rampline account, we will send a link to choose a
        new password.
      </p>
      <div className="mt-6">
        <ForgotPasswordForm />
      </div>
      <p className="mt-6">
        <Link href="/sign-in">Back to sign in</Link>
      </p>
    </>
  );
}
