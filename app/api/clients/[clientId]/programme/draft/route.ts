import { requireClientAccess } from "@/lib/auth/access";
import { saveDraftSchema } from "@/lib/programmes/draft-schema";
import { saveDraft } from "@/lib/programmes/save-draft";
import { route } from "@/lib/http/route";

// Drafts can hold four channels of settings, markers and steps; 256 KB is far more than that needs.
export const PUT = route<typeof saveDraftSchema, { clientId: string }>(
  {
    roles: ["therapist"],
    authorize: ({ actor, params }) => requireClientAccess(actor, params.clientId),
    body: saveDraftSchema,
    maxBytes: 256 * 1024,
  },
  ({ actor, data, params }) => saveDraft(actor, params.clientId, data),
);
