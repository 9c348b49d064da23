import { requireClientAccess } from "@/lib/auth/access";
import { recordElectrodePack, recordPackSchema } from "@/lib/electrode-packs/record-pack";
import { route } from "@/lib/http/route";

export const POST = route<typeof recordPackSchema, { clientId: string }>(
  { roles: ["client", "carer"], authorize: ({ actor, params }) => requireClientAccess(actor, params.clientId), body: recordPackSchema, status: 201 },
  ({ actor, data, params }) => recordElectrodePack(actor, params.clientId, data),
);
