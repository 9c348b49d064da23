import type { ReactNode } from "react";
import { requirePageActor } from "@/lib/auth/page-guards";

// The role check sits in this layout, above loading.tsx's Suspense boundary, so a refusal gets a real 403 status
// instead of a streamed 200. The page checks again (the lookup is cached per request).
export default async function Layout({ children }: { children: ReactNode }) {
  await requirePageActor("client", "carer");
  return children;
}
