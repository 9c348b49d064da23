import Link from "next/link";
import type { ReactNode } from "react";
import { Wordmark } from "@/components/brand";

export function ProblemPage({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div className="mx-auto flex min-h-dvh max-w-lg flex-col px-5 py-8">
      <header className="mb-8">
        <Wordmark />
      </header>
      <main id="main" className="rounded-lg border border-line bg-card p-6">
        <h1 className="text-2xl">{title}</h1>
        <div className="mt-3 text-ink-soft">{children}</div>
        <p className="mt-6">
          <Link href="/home">Go to your home page</Link>
        </p>
      </main>
    </div>
  );
}
