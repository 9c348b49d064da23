import { requireClientAccess } from "@/lib/auth/access";
import { ROLES } from "@/lib/auth/roles";
import { route } from "@/lib/http/route";
import { uploadClientPhoto } from "@/lib/uploads/upload-client-photo";

// multipart/form-data with `kind` (placement | skin | message) and the file `photo`. The wrapper gives 401 and the
// client's 404 before any of the body is read; the multipart body is then read by the upload itself.
export const POST = route<undefined, { clientId: string }>(
  {
    roles: ROLES,
    authorize: ({ actor, params }) => requireClientAccess(actor, params.clientId),
  },
  async ({ actor, params, request }) => {
    const photo = await uploadClientPhoto(actor, params.clientId, request);
    return Response.json(photo, { status: 201, headers: { Location: photo.url, "Cache-Control": "no-store" } });
  },
);
