import type { ReactNode } from "react";
import { AppHeader, type NavItem } from "@/components/layout/app-header";
import { requirePageActor } from "@/lib/auth/page-guards";

// Screens for clinic staff. Each page checks its own role too: a layout is not a security boundary in Next.
export default async function ClinicLayout({ children }: { children: ReactNode }) {
  const actor = await requirePageActor("admin", "therapist");
  const nav: NavItem[] =
    actor.role === "admin"
      ? [
          { href: "/team", label: "Team" },
          { href: "/audit", label: "Audit trail" },
        ]
      : [{ href: "/caseload", label: "Caseload" }];
  nav.push({ href: "/explore", label: "Settings explorer" });
  return (
    <>
      <AppHeader actor={actor} nav={nav} />
      <main id="main" className="mx-auto max-w-6xl px-5 py-8">
        {children}
      </main>
    </>
  );
}
