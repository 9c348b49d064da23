import type { Actor } from "@/lib/auth/actor";
import { requireClientAccess } from "@/lib/auth/access";
import { route } from "@/lib/http/route";
import { listScreeningsForClient } from "@/lib/screening/read";
import { signScreeningSchema } from "@/lib/screening/schema";
import { signScreening } from "@/lib/screening/sign";

type Params = { clientId: string };
const authorize = ({ actor, params }: { actor: Actor; params: Params }) => requireClientAccess(actor, params.clientId);

// Clinic staff read the versions; clients and carers get 403 (see lib/screening/read.ts). Clinical data: never cached.
export const GET = route<undefined, Params>({ roles: ["therapist", "admin"], authorize }, async ({ actor, params }) =>
  Response.json({ screenings: await listScreeningsForClient(actor, params.clientId) }, { headers: { "Cache-Control": "no-store" } }),
);

// Only a therapist signs; the new version is theirs, at this moment.
export const POST = route<typeof signScreeningSchema, Params>(
  { roles: ["therapist"], authorize, body: signScreeningSchema, status: 201 },
  ({ actor, data, params }) => signScreening(actor, params.clientId, data),
);
