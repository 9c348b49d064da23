import { z } from "zod";
import { AppError } from "@/lib/errors";
import { readJson } from "@/lib/http/read-json";
import { errorResponse } from "@/lib/http/responses";
import { analyseChannel } from "@/lib/stim";

// One channel's settings are well under 2 KB; a public endpoint has no reason to read more than this.
const MAX_BYTES = 16 * 1024;

// The body is read as any JSON value: analyseChannel does the parsing itself, so the field messages are the
// same ones the builder shows beside its fields.
const anyJson = z.unknown();

/**
 * POST /api/stim/analyse: public, no session and no database, so it stays cheap.
 * 200 with the ChannelAnalysis whenever the settings parse, even when a finding blocks publishing (`ok: false`):
 * the analysis is the answer. 400 VALIDATION with one message per field when they do not parse; 400 BAD_REQUEST
 * for malformed JSON, 413 over 16 KB, 415 when the body is not JSON.
 */
export async function POST(request: Request): Promise<Response> {
  try {
    const body = await readJson(request, anyJson, MAX_BYTES);
    const analysis = analyseChannel(body);
    if (!analysis.settings) {
      throw new AppError("VALIDATION", "Some settings need attention.", analysis.fieldErrors);
    }
    return Response.json(analysis, { headers: { "Cache-Control": "no-store" } });
  } catch (error) {
    return errorResponse(error);
  }
}
