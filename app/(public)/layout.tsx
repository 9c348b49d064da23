import Link from "next/link";
import type { ReactNode } from "react";
import { Wordmark } from "@/components/brand";
import { buttonClasses } from "@/components/ui/button";

// Pages anyone may open without signing in. Nothing here reads the session or the database.
export default function PublicLayout({ children }: { children: ReactNode }) {
  return (
    <div className="mx-auto flex min-h-dvh max-w-7xl flex-col px-5">
      <header className="flex items-center justify-between gap-4 py-6">
        <Wordmark />
        <Link href="/sign-in" className={buttonClasses("secondary")}>
          Sign in
        </Link>
      </header>
      <main id="main" className="flex-1 pb-12">
        {children}
      </main>
      <footer className="border-t border-line py-6 text-sm text-ink-soft">
        Rampline is not a medical device and makes no clinical decisions.
      </footer>
    </div>
  );
}
