import type { BrowserContext, Page, Response } from "playwright-core";
import { expect } from "vitest";
import { APP_URL } from "./env";
import { directive, scriptNonce, scriptTagsWithoutNonce, watchCspViolations } from "./page-security";

export type OpenedScreen = { page: Page; response: Response; violations: () => Promise<string[]> };

export async function openScreen(context: BrowserContext, path: string): Promise<OpenedScreen> {
  const page = await context.newPage();
  const violations = await watchCspViolations(page);
  const response = await page.goto(path);
  if (!response) throw new Error(`No response for ${path}`);
  // Wait for the page to be drawn, so scripts that load late have had their chance to be refused.
  await page.getByRole("heading", { level: 1 }).first().waitFor();
  return { page, response, violations };
}

// The headers and script nonces every screen must have, checked on the response the browser actually got.
export async function expectProtectiveHeaders({ page, response }: OpenedScreen, path: string, status = 200) {
  expect(response.status()).toBe(status);
  // Not quietly sent elsewhere (to sign-in, say): the checks are about this very screen.
  expect(new URL(page.url()).pathname).toBe(new URL(path, APP_URL).pathname);

  const headers = response.headers();
  const csp = headers["content-security-policy"] ?? "";
  const nonce = scriptNonce(csp);
  expect(nonce, csp).toBeTruthy();
  expect(directive(csp, "script-src")).not.toMatch(/'unsafe-inline'|'unsafe-eval'/);
  expect(directive(csp, "frame-ancestors")).toBe("frame-ancestors 'none'");
  expect(headers["x-content-type-options"]).toBe("nosniff");
  expect(headers["x-frame-options"]).toBe("DENY");

  const html = await response.text();
  expect(html).toContain("<script");
  expect(scriptTagsWithoutNonce(html, nonce ?? "")).toEqual([]);
}

// zod 4 tries `new Function("")` once to see whether it may compile parsers; a strict policy refuses and reports
// it. The app can switch the probe off (z.config({ jitless: true })); until it does, this is the one known report.
export function isZodEvalProbe(violation: string): boolean {
  return violation.startsWith("script-src blocked eval");
}
