import type { ReactNode } from "react";
import { AppHeader } from "@/components/layout/app-header";
import { requirePageActor } from "@/lib/auth/page-guards";

// Pages about one's own account, for every role.
export default async function AccountLayout({ children }: { children: ReactNode }) {
  const actor = await requirePageActor();
  return (
    <>
      <AppHeader actor={actor} nav={[{ href: "/home", label: "Home" }]} />
      <main id="main" className="mx-auto max-w-2xl px-5 py-8">
        {children}
      </main>
    </>
  );
}
