import Link from "next/link";
import type { ReactNode } from "react";
import { Wordmark } from "@/components/brand";

// The words of a problem page. Inside a route group the group's layout already gives the page its header and
// <main>, so only this part is rendered there; at the root it is wrapped in a page of its own.
export function ProblemContent({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div className="max-w-lg rounded-lg border border-line bg-card p-6">
      <h1 className="text-2xl">{title}</h1>
      <div className="mt-3 text-ink-soft">{children}</div>
      <p className="mt-6">
        <Link href="/home">Go to your home page</Link>
      </p>
    </div>
  );
}

export function ProblemPage({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div className="mx-auto flex min-h-dvh max-w-lg flex-col px-5 py-8">
      <header className="mb-8">
        <Wordmark />
      </header>
      <main id="main">
        <ProblemContent title={title}>{children}</ProblemContent>
      </main>
    </div>
  );
}

export const NOT_FOUND_TEXT = {
  title: "Page not found",
  body: "There is nothing at this address, or it is not yours to see. Check the link, or start again from your home page.",
};
export const FORBIDDEN_TEXT = { title: "Not available to your role", body: "This page is for other members of the clinic." };
