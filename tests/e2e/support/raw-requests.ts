import type { APIRequestContext } from "playwright-core";

// Bodies sent byte for byte as given, so a test can send what no form ever would. (A string would not do: with a
// JSON content type Playwright re-encodes a string that does not parse as JSON.) The request context carries the
// browser context's cookies and client address.
export function postRaw(request: APIRequestContext, path: string, body: string, contentType = "application/json") {
  return request.post(path, { data: Buffer.from(body, "utf8"), headers: { "content-type": contentType } });
}

// Comfortably over the 64 KB the JSON routes accept.
export function oversizedText(): string {
  return "x".repeat(70 * 1024);
}
