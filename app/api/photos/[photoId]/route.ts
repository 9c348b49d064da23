import { route } from "@/lib/http/route";
import { photoResponse } from "@/lib/uploads/serve-photo";

// The stored bytes of one photo (`?size=thumb` for the thumbnail). Public at the wrapper on purpose: someone not
// signed in gets the same 404 as a photo they may not see or that does not exist (see lib/uploads/NOTES.md).
export const GET = route<undefined, { photoId: string }>({ roles: "public" }, ({ actor, params, request }) =>
  photoResponse(actor, params.photoId, new URL(request.url).searchParams.get("size")),
);
