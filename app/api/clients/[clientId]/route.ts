import { requireClientAccess } from "@/lib/auth/access";
import { clientDetailsSchema } from "@/lib/clients/schemas";
import { updateClientDetails } from "@/lib/clients/update-details";
import { route } from "@/lib/http/route";

export const PATCH = route<typeof clientDetailsSchema, { clientId: string }>(
  {
    roles: ["therapist"],
    authorize: ({ actor, params }) => requireClientAccess(actor, params.clientId),
    body: clientDetailsSchema,
  },
  ({ actor, data, params }) => updateClientDetails(actor, params.clientId, data),
);
