import type { IncomingMessage, ServerResponse } from "node:http";

/** The error names the resend SDK declares, so code that branches on `error.name` behaves as it would in production. */
export type ResendErrorName =
  | "validation_error"
  | "missing_required_field"
  | "missing_api_key"
  | "invalid_api_key"
  | "invalid_idempotency_key"
  | "invalid_idempotent_request"
  | "invalid_parameter"
  | "not_found"
  | "method_not_allowed"
  | "application_error";

export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly errorName: ResendErrorName,
    message: string,
  ) {
    super(message);
  }
}

export function sendJson(res: ServerResponse, status: number, body: unknown, headers: Record<string, string> = {}): void {
  const payload = JSON.stringify(body);
  res.writeHead(status, {
    "content-type": "application/json; charset=utf-8",
    "content-length": Buffer.byteLength(payload),
    "cache-control": "no-store",
    ...headers,
  });
  res.end(payload);
}

// The SDK hands this JSON back to the caller as `error` unchanged, so it carries the same three fields as the real
// service's errors.
export function sendError(res: ServerResponse, error: HttpError, headers: Record<string, string> = {}): void {
  sendJson(res, error.status, { statusCode: error.status, name: error.errorName, message: error.message }, headers);
}

// Mail bodies are shown inside an iframe that inherits this policy: no scripts run, but remote images and inline styles
// in the message still render.
const PAGE_POLICY = [
  "default-src 'none'",
  "style-src 'unsafe-inline' *",
  "img-src * data:",
  "font-src * data:",
  "frame-ancestors 'none'",
  "form-action 'none'",
].join("; ");

export function sendHtml(res: ServerResponse, status: number, html: string): void {
  res.writeHead(status, {
    "content-type": "text/html; charset=utf-8",
    "content-length": Buffer.byteLength(html),
    "cache-control": "no-store",
    "content-security-policy": PAGE_POLICY,
    "referrer-policy": "no-referrer",
    "x-content-type-options": "nosniff",
  });
  res.end(html);
}

function formatBytes(bytes: number): string {
  return bytes % 1_048_576 === 0 ? `${bytes / 1_048_576} MiB` : `${bytes} bytes`;
}

/**
 * Reads the whole body, keeping at most `maxBytes`. An oversized body is still read to the end (up to a hard stop)
 * because answering mid-upload makes many HTTP clients, fetch included, report a network failure instead of the 413.
 */
export async function readBody(req: IncomingMessage, maxBytes: number): Promise<Buffer> {
  const hardStop = Math.max(maxBytes * 4, 64 * 1_048_576);
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req as AsyncIterable<Buffer>) {
    size += chunk.length;
    if (size > hardStop) {
      req.destroy();
      break;
    }
    if (size <= maxBytes) chunks.push(chunk);
  }
  if (size > maxBytes) {
    throw new HttpError(413, "validation_error", `The request body is larger than the limit of ${formatBytes(maxBytes)}.`);
  }
  return Buffer.concat(chunks);
}

/** Used before refusing a request, for the same reason readBody finishes reading oversized bodies. */
export async function discardBody(req: IncomingMessage, maxBytes: number): Promise<void> {
  await readBody(req, maxBytes).catch(() => undefined);
}

export async function readJsonBody(req: IncomingMessage, maxBytes: number): Promise<unknown> {
  const raw = await readBody(req, maxBytes);
  try {
    return JSON.parse(raw.toString("utf8")) as unknown;
  } catch {
    throw new HttpError(400, "validation_error", "The request body is not valid JSON.");
  }
}
