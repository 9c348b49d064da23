import "server-only";
import { getClientById } from "@/db/queries/clients";
import type { Client } from "@/db/schema";
import { forbidden, notFound, notSignedIn } from "@/lib/errors";
import type { Actor } from "./actor";
import type { Role } from "./roles";

// The small set of authorisation checks every page, action and route handler goes through.

export function requireActor(actor: Actor | null): Actor {
  if (!actor) throw notSignedIn();
  return actor;
}

export function requireRole(actor: Actor | null, ...roles: Role[]): Actor {
  const signedIn = requireActor(actor);
  if (!roles.includes(signedIn.role)) throw forbidden();
  return signedIn;
}

// Staff reach every client of their own clinic; a client reaches their own record; a carer the one they are linked to.
export function canAccessClient(actor: Actor, record: Pick<Client, "id" | "organizationId">): boolean {
  if (record.organizationId !== actor.organizationId) return false;
  if (actor.role === "admin" || actor.role === "therapist") return true;
  return actor.clientId === record.id;
}

export async function requireClientAccess(actor: Actor | null, clientId: string): Promise<{ actor: Actor; client: Client }> {
  const signedIn = requireActor(actor);
  const record = await getClientById(clientId);
  if (!record || !canAccessClient(signedIn, record)) throw notFound("That client");
  return { actor: signedIn, client: record };
}
