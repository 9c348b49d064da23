import { route } from "@/lib/http/route";
import { requireFlagAccess, updateFlag, updateFlagSchema } from "@/lib/flags/update-flag";

export const PATCH = route<typeof updateFlagSchema, { flagId: string }>(
  { roles: ["therapist"], authorize: ({ actor, params }) => requireFlagAccess(actor, params.flagId), body: updateFlagSchema },
  ({ actor, data, params }) => updateFlag(actor, params.flagId, data),
);
