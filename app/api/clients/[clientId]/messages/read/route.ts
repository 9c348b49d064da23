import { requireClientAccess } from "@/lib/auth/access";
import { route } from "@/lib/http/route";
import { markThreadRead } from "@/lib/messages/read-thread";

export const POST = route<undefined, { clientId: string }>(
  { roles: ["admin", "therapist", "client", "carer"], authorize: ({ actor, params }) => requireClientAccess(actor, params.clientId) },
  ({ actor, params }) => markThreadRead(actor, params.clientId),
);
