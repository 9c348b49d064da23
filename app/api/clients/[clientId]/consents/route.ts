import { requireClientAccess } from "@/lib/auth/access";
import { recordConsentSchema } from "@/lib/clients/schemas";
import { recordConsent } from "@/lib/consents/record-consent";
import { route } from "@/lib/http/route";

export const POST = route<typeof recordConsentSchema, { clientId: string }>(
  {
    roles: ["therapist", "client"],
    authorize: ({ actor, params }) => requireClientAccess(actor, params.clientId),
    body: recordConsentSchema,
    status: 201,
  },
  ({ actor, data, params }) => recordConsent(actor, params.clientId, data),
);
