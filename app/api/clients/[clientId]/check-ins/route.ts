import { requireClientAccess } from "@/lib/auth/access";
import { logCheckIn } from "@/lib/check-ins/log-check-in";
import { checkInSchema } from "@/lib/check-ins/schema";
import { route } from "@/lib/http/route";

export const POST = route<typeof checkInSchema, { clientId: string }>(
  {
    roles: ["client", "carer"],
    authorize: ({ actor, params }) => requireClientAccess(actor, params.clientId),
    body: checkInSchema,
    status: 201,
  },
  ({ actor, data, params }) => logCheckIn(actor, params.clientId, data),
);
