import { route } from "@/lib/http/route";
import { setTherapistActive, setTherapistActiveSchema } from "@/lib/team/set-therapist-active";

export const PATCH = route<typeof setTherapistActiveSchema, { memberId: string }>(
  { roles: ["admin"], body: setTherapistActiveSchema },
  ({ actor, data, params }) => setTherapistActive(actor, params.memberId, data),
);
