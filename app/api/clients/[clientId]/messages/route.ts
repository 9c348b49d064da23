import type { Actor } from "@/lib/auth/actor";
import { requireClientAccess } from "@/lib/auth/access";
import { route } from "@/lib/http/route";
import { postMessage } from "@/lib/messages/post-message";
import { readThread } from "@/lib/messages/read-thread";
import { postMessageSchema } from "@/lib/messages/schema";

const authorize = ({ actor, params }: { actor: Actor; params: { clientId: string } }) => requireClientAccess(actor, params.clientId);

export const GET = route<undefined, { clientId: string }>({ roles: ["admin", "therapist", "client", "carer"], authorize }, async ({ actor, params }) =>
  Response.json(await readThread(actor, params.clientId), { headers: { "Cache-Control": "no-store" } }),
);

export const POST = route<typeof postMessageSchema, { clientId: string }>(
  { roles: ["therapist", "client", "carer"], authorize, body: postMessageSchema, status: 201 },
  ({ actor, data, params }) => postMessage(actor, params.clientId, data),
);
