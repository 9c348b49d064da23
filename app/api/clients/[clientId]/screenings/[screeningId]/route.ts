import { requireClientAccess } from "@/lib/auth/access";
import { route } from "@/lib/http/route";
import { getScreeningVersion } from "@/lib/screening/read";

type Params = { clientId: string; screeningId: string };

// One signed version with its answers and clearances, for clinic staff only. Clinical data: never cached.
export const GET = route<undefined, Params>(
  { roles: ["therapist", "admin"], authorize: ({ actor, params }) => requireClientAccess(actor, params.clientId) },
  async ({ actor, params }) =>
    Response.json(
      { screening: await getScreeningVersion(actor, params.clientId, { id: params.screeningId }) },
      { headers: { "Cache-Control": "no-store" } },
    ),
);
