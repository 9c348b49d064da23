import { route } from "@/lib/http/route";
import { requireTherapistMember, setTherapistActive, setTherapistActiveSchema } from "@/lib/team/set-therapist-active";

export const PATCH = route<typeof setTherapistActiveSchema, { memberId: string }>(
  {
    roles: ["admin"],
    authorize: ({ actor, params }) => requireTherapistMember(actor, params.memberId),
    body: setTherapistActiveSchema,
  },
  ({ actor, data, params }) => setTherapistActive(actor, params.memberId, data),
);
