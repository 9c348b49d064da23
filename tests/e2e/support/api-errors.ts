import type { APIResponse } from "playwright-core";
import { expect } from "vitest";

export type ApiErrorBody = { code: string; message: string; fields?: Record<string, string> };

// Every refusal from Rampline's JSON routes has one shape, { error: { code, message, fields? } }, and nothing more:
// no stack trace, no SQL, no framework page.
export async function expectApiError(response: APIResponse, status: number, code: string): Promise<ApiErrorBody> {
  const text = await response.text();
  expect(response.status(), text).toBe(status);
  expect(response.headers()["content-type"]).toContain("application/json");
  const body = JSON.parse(text) as { error: ApiErrorBody };
  expect(Object.keys(body)).toEqual(["error"]);
  expect(body.error.code).toBe(code);
  expect(body.error.message).toMatch(/\w/);
  for (const key of Object.keys(body.error)) expect(["code", "message", "fields"]).toContain(key);
  expect(text).not.toMatch(/\bat .+\(.+:\d+:\d+\)|node_modules|SELECT |INSERT /);
  return body.error;
}
