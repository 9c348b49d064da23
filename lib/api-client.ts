import type { ErrorCode, FieldErrors } from "./errors";

// The browser side of Rampline's JSON routes: one error shape everywhere, so forms can show field messages.
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode | "NETWORK",
    message: string,
    readonly fields?: FieldErrors,
    readonly reasons?: string[],
  ) {
    super(message);
  }
}

export async function sendJson<T = unknown>(method: "POST" | "PATCH" | "PUT" | "DELETE", url: string, body?: unknown): Promise<T> {
  let response: Response;
  try {
    response = await fetch(url, {
      method,
      headers: { "Content-Type": "application/json", Accept: "application/json" },
      body: body === undefined ? undefined : JSON.stringify(body),
      credentials: "same-origin",
    });
  } catch {
    throw new ApiError(0, "NETWORK", "Rampline could not be reached. Check your connection and try again.");
  }
  const payload = (await response.json().catch(() => null)) as
    | (T & { error?: { code: ErrorCode; message: string; fields?: FieldErrors; reasons?: string[] } })
    | null;
  if (!response.ok) {
    const error = payload?.error;
    throw new ApiError(response.status, error?.code ?? "INTERNAL", error?.message ?? "Something went wrong. Please try again.", error?.fields, error?.reasons);
  }
  return payload as T;
}
