import type { ReactNode } from "react";
import { requirePageClientAccess } from "@/lib/auth/page-guards";

// Screenings are for clinic staff of the client's clinic. The check sits in this layout, above every loading.tsx of
// the screening pages (each page's own loading.tsx is in its folder or route group, below the check that decides
// its status); the pages check again (the lookups are cached per request). See lib/screening/NOTES.md.
export default async function Layout({ children, params }: { children: ReactNode; params: Promise<{ clientId: string }> }) {
  await requirePageClientAccess((await params).clientId, "therapist", "admin");
  return children;
}
