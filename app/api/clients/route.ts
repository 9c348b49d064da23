import { inviteClient } from "@/lib/invitations/invite-client";
import { inviteClientSchema } from "@/lib/invitations/schemas";
import { route } from "@/lib/http/route";

export const POST = route({ roles: ["therapist"], body: inviteClientSchema, status: 201 }, ({ actor, data }) =>
  inviteClient(actor, data),
);
