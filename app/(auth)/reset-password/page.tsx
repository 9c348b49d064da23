import type { Metadata } from "next";
import Link from "next/link";
import { Notice } from "@/components/ui/notice";
import { ResetPasswordForm } from "./_components/reset-password-form";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  return (
    <>
      <h1 className="text-2xl">Choose a new password</h1>
      <div className="mt-6">
        {token ? (
          <ResetPasswordForm token={token} />
        ) : (
          <Notice tone="warning" word="Link incomplete">
            This page needs the link from your e-mail. <Link href="/forgot-password">Ask for a new link</Link>.
          </Notice>
        )}
      </div>
    </>
  );
}
