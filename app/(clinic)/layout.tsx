import type { ReactNode } from "react";
import { AppHeader, type NavItem } from "@/components/layout/app-header";
import { listClientIdsByTherapistId } from "@/db/queries/clients";
import { countOpenFlagsByTherapistId } from "@/db/queries/flags";
import { countUnreadForUser } from "@/db/queries/messages";
import { requirePageActor } from "@/lib/auth/page-guards";

// A therapist's caseload shows unread messages and the review queue open flags, in words as well as a badge.
async function therapistNav(organizationId: string, userId: string): Promise<NavItem[]> {
  const [unread, flags] = await Promise.all([
    listClientIdsByTherapistId(organizationId, userId).then((ids) => countUnreadForUser(userId, ids)),
    countOpenFlagsByTherapistId(organizationId, userId),
  ]);
  return [
    { href: "/caseload", label: "Caseload", badge: unread > 0 ? `${unread} unread` : undefined },
    { href: "/review", label: "Review queue", badge: flags > 0 ? `${flags} open` : undefined },
  ];
}

// Screens for clinic staff. Each page checks its own role too: a layout is not a security boundary in Next.
export default async function ClinicLayout({ children }: { children: ReactNode }) {
  const actor = await requirePageActor("admin", "therapist");
  const nav: NavItem[] =
    actor.role === "admin"
      ? [
          { href: "/team", label: "Team" },
          { href: "/review", label: "Flags" },
          { href: "/audit", label: "Audit trail" },
        ]
      : await therapistNav(actor.organizationId, actor.userId);
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
