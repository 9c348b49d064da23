import { redirect } from "next/navigation";
import { requirePageActor } from "@/lib/auth/page-guards";
import type { Role } from "@/lib/auth/roles";

const HOMES: Record<Role, string> = { admin: "/team", therapist: "/caseload", client: "/today", carer: "/today" };

// Where "home" is depends on who you are.
export default async function HomeRedirect() {
  const actor = await requirePageActor();
  redirect(HOMES[actor.role]);
}
