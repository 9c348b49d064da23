import type { ReactNode } from "react";
import { requirePageActor } from "@/lib/auth/page-guards";

// The role check sits above loading.tsx so a refusal gets a real 403 status (see DEVELOPERS.md).
export default async function Layout({ children }: { children: ReactNode }) {
  await requirePageActor("therapist", "admin");
  return children;
}
