import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { getCurrentActor } from "@/lib/auth/current";
import { SignInForm } from "./_components/sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ reset?: string }> }) {
  if (await getCurrentActor()) redirect("/home");
  const { reset } = await searchParams;
  return (
    <>
      <h1 className="text-2xl">Sign in</h1>
      <p className="mt-2 text-ink-soft">Rampline is by invitation from your clinic. Use the e-mail address it was sent to.</p>
      <div className="mt-6">
        <SignInForm passwordWasReset={reset === "done"} />
      </div>
      <p className="mt-6">
        <Link href="/forgot-password">Forgotten your password?</Link>
      </p>
    </>
  );
}
