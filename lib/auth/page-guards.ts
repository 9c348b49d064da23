import "server-only";
import { forbidden, notFound, redirect } from "next/navigation";
import { AppError } from "@/lib/errors";
import type { Actor } from "./actor";
import { requireClientAccess } from "./access";
import { getCurrentActor } from "./current";
import type { Role } from "./roles";

// Pages turn the shared checks into Next's own interrupts: sign-in redirect, 403 page, 404 page.

export async function requirePageActor(...roles: Role[]): Promise<Actor> {
  const actor = await getCurrentActor();
  if (!actor) redirect("/sign-in");
  if (roles.length > 0 && !roles.includes(actor.role)) forbidden();
  return actor;
}

export async function requirePageClientAccess(clientId: string, ...roles: Role[]) {
  const actor = await requirePageActor(...roles);
  try {
    return await requireClientAccess(actor, clientId);
  } catch (error) {
    if (error instanceof AppError && error.code === "NOT_FOUND") notFound();
    throw error;
  }
}
