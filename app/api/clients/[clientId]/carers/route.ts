import { requireClientAccess } from "@/lib/auth/access";
import { inviteCarer } from "@/lib/invitations/invite-carer";
import { inviteCarerSchema } from "@/lib/invitations/schemas";
import { route } from "@/lib/http/route";

export const POST = route<typeof inviteCarerSchema, { clientId: string }>(
  {
    roles: ["client", "therapist"],
    authorize: ({ actor, params }) => requireClientAccess(actor, params.clientId),
    body: inviteCarerSchema,
    status: 201,
  },
  ({ actor, data, params }) => inviteCarer(actor, params.clientId, data),
);
