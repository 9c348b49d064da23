import type { z } from "zod";
import { AppError } from "@/lib/errors";
import { fieldErrorsFrom } from "@/lib/validation";

export const DEFAULT_JSON_LIMIT_BYTES = 64 * 1024;

async function readTextWithLimit(request: Request, maxBytes: number): Promise<string> {
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > maxBytes) throw tooLarge(maxBytes);
  if (!request.body) return "";
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    // The declared length can lie (or be absent with chunked bodies), so the limit is enforced while reading.
    if (total > maxBytes) {
      await reader.cancel();
      throw tooLarge(maxBytes);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks).toString("utf8");
}

function tooLarge(maxBytes: number) {
  return new AppError("PAYLOAD_TOO_LARGE", `The request is too large (the limit is ${Math.round(maxBytes / 1024)} KB).`);
}

export async function readJson<S extends z.ZodType>(request: Request, schema: S, maxBytes = DEFAULT_JSON_LIMIT_BYTES) {
  const type = request.headers.get("content-type") ?? "";
  if (!type.toLowerCase().startsWith("application/json")) {
    throw new AppError("UNSUPPORTED_MEDIA_TYPE", "Send the request as JSON (Content-Type: application/json).");
  }
  const text = await readTextWithLimit(request, maxBytes);
  let raw: unknown;
  try {
    raw = text.length === 0 ? undefined : JSON.parse(text);
  } catch {
    throw new AppError("BAD_REQUEST", "The request body is not valid JSON.");
  }
  const parsed = schema.safeParse(raw);
  if (!parsed.success) {
    throw new AppError("VALIDATION", "Some fields need attention.", fieldErrorsFrom(parsed.error));
  }
  return parsed.data as z.output<S>;
}
