import type { ReactNode } from "react";
import { requirePageClientAccess } from "@/lib/auth/page-guards";

// Only a therapist signs a screening; clinic admins read the history. The check sits in this layout, above this
// segment's loading.tsx; the page checks again (the lookups are cached per request).
export default async function Layout({ children, params }: { children: ReactNode; params: Promise<{ clientId: string }> }) {
  await requirePageClientAccess((await params).clientId, "therapist");
  return children;
}
