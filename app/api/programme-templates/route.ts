import { route } from "@/lib/http/route";
import { saveProgrammeTemplate, saveTemplateSchema } from "@/lib/programmes/save-template";

export const POST = route({ roles: ["therapist"], body: saveTemplateSchema, status: 201, maxBytes: 128 * 1024 }, ({ actor, data }) =>
  saveProgrammeTemplate(actor, data),
);
