import "server-only";
import type { Actor } from "@/lib/auth/actor";
import { requireClientAccess } from "@/lib/auth/access";
import { AppError } from "@/lib/errors";
import { getHandoutData } from "@/lib/programmes/handout-data";
import type { ObjectStorage } from "@/lib/storage";
import { loadHandoutPhotos } from "./load-handout-photos";
import { renderHandoutPdf } from "./render-handout-pdf";

// The file name carries no name of a person: downloads end up in shared folders and on shared computers.
export const handoutFileName = (versionNumber: number) => `rampline-handout-v${versionNumber}.pdf`;

// The client's handout for the version in force, as a PDF download. Anyone outside the client's circle and
// clinic gets the client's 404, so the answer reveals nothing; a client with nothing published gets a 404 too.
export async function handoutPdfResponse(actor: Actor, clientId: string, storage?: ObjectStorage): Promise<Response> {
  const { client } = await requireClientAccess(actor, clientId);
  const data = await getHandoutData(client);
  if (!data) throw new AppError("NOT_FOUND", "No programme has been published for this client yet.");
  const photos = await loadHandoutPhotos(client, data.content, storage);
  const pdf = await renderHandoutPdf({ ...data, photos });
  return new Response(new Uint8Array(pdf), {
    status: 200,
    headers: {
      "Content-Type": "application/pdf",
      "Content-Length": String(pdf.length),
      "Content-Disposition": `attachment; filename="${handoutFileName(data.versionNumber)}"`,
      // Health data: never kept by a shared cache, and never sniffed into anything but a PDF.
      "Cache-Control": "private, no-store",
      "X-Content-Type-Options": "nosniff",
    },
  });
}
