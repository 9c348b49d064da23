import "server-only";
import { notFound } from "next/navigation";
import { getClientById } from "@/db/queries/clients";
import { requirePageActor } from "./page-guards";

// For client and carer pages: the one client record this person acts on.
export async function requireOwnClient() {
  const actor = await requirePageActor("client", "carer");
  const client = actor.clientId ? await getClientById(actor.clientId) : null;
  if (!client || client.organizationId !== actor.organizationId) notFound();
  return { actor, client };
}
