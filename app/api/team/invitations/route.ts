import { inviteTherapist } from "@/lib/invitations/invite-therapist";
import { inviteTherapistSchema } from "@/lib/invitations/schemas";
import { route } from "@/lib/http/route";

export const POST = route({ roles: ["admin"], body: inviteTherapistSchema, status: 201 }, ({ actor, data }) =>
  inviteTherapist(actor, data),
);
