import type { ReactNode } from "react";
import { Wordmark } from "@/components/brand";

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <div className="mx-auto flex min-h-dvh max-w-lg flex-col px-5 py-8">
      <header className="mb-8">
        <Wordmark />
      </header>
      <main id="main" className="rounded-lg border border-line bg-card p-6 shadow-sm">
        {children}
      </main>
    </div>
  );
}
