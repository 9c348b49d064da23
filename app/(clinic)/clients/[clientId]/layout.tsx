import type { ReactNode } from "react";
import { requirePageClientAccess } from "@/lib/auth/page-guards";

// The access check sits in this layout, above loading.tsx's Suspense boundary, so a client outside the clinic gets a
// real 404 status instead of a streamed 200. The page checks again: one indexed lookup, and the page needs the record.
export default async function Layout({ children, params }: { children: ReactNode; params: Promise<{ clientId: string }> }) {
  await requirePageClientAccess((await params).clientId, "therapist", "admin");
  return children;
}
