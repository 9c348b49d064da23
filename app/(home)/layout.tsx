import type { ReactNode } from "react";
import { AppHeader } from "@/components/layout/app-header";
import { countUnreadForUser } from "@/db/queries/messages";
import { requirePageActor } from "@/lib/auth/page-guards";

// Client and carer screens: mobile first, large targets, calm.
export default async function HomeLayout({ children }: { children: ReactNode }) {
  const actor = await requirePageActor("client", "carer");
  const unread = actor.clientId ? await countUnreadForUser(actor.userId, [actor.clientId]) : 0;
  return (
    <>
      <AppHeader actor={actor} nav={[
          { href: "/today", label: "Today" },
          { href: "/programme", label: "Programme" },
          { href: "/messages", label: "Messages", badge: unread > 0 ? `${unread} new` : undefined },
          { href: "/history", label: "History" },
        ]} />
      <main id="main" className="mx-auto max-w-2xl px-4 py-6 text-lg">
        {children}
      </main>
    </>
  );
}
