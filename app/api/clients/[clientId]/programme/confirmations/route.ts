import { requireClientAccess } from "@/lib/auth/access";
import { confirmVersion, confirmVersionSchema } from "@/lib/confirmations/confirm-version";
import { route } from "@/lib/http/route";

export const POST = route<typeof confirmVersionSchema, { clientId: string }>(
  { roles: ["client", "carer"], authorize: ({ actor, params }) => requireClientAccess(actor, params.clientId), body: confirmVersionSchema, status: 201 },
  ({ actor, data, params }) => confirmVersion(actor, params.clientId, data),
);
