import { requireClientAccess } from "@/lib/auth/access";
import { route } from "@/lib/http/route";
import { recordClearanceSchema } from "@/lib/screening/clearance-schema";
import { recordRedFlagClearance } from "@/lib/screening/record-clearance";

type Params = { clientId: string; screeningId: string };

export const POST = route<typeof recordClearanceSchema, Params>(
  {
    roles: ["therapist"],
    authorize: ({ actor, params }) => requireClientAccess(actor, params.clientId),
    body: recordClearanceSchema,
    status: 201,
  },
  ({ actor, data, params }) => recordRedFlagClearance(actor, params.clientId, params.screeningId, data),
);
