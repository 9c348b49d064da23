import { requireClientAccess } from "@/lib/auth/access";
import { publishSchema } from "@/lib/programmes/draft-schema";
import { publishProgramme } from "@/lib/programmes/publish";
import { route } from "@/lib/http/route";

export const POST = route<typeof publishSchema, { clientId: string }>(
  {
    roles: ["therapist"],
    authorize: ({ actor, params }) => requireClientAccess(actor, params.clientId),
    body: publishSchema,
    status: 201,
  },
  ({ actor, data, params }) => publishProgramme(actor, params.clientId, data),
);
