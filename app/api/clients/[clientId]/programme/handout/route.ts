import { requireClientAccess } from "@/lib/auth/access";
import { handoutPdfResponse } from "@/lib/handout-pdf/handout-pdf-response";
import { route } from "@/lib/http/route";

// @react-pdf/renderer needs Node (fontkit, zlib, Buffer); it cannot run on the edge runtime.
export const runtime = "nodejs";

// The printable handout as a PDF download, for anyone who can reach the client: staff of the clinic, the client
// and their carers. The wrapper gives 401, then the client's 404 for anyone outside its circle.
export const GET = route<undefined, { clientId: string }>(
  {
    roles: ["admin", "therapist", "client", "carer"],
    authorize: ({ actor, params }) => requireClientAccess(actor, params.clientId),
  },
  ({ actor, params }) => handoutPdfResponse(actor, params.clientId),
);
