import type { Locator, Page } from "playwright-core";
import { expect } from "vitest";

// Client-side checks run after a React render, and the machine is shared, so polls get more than the default second.
export const POLL = { timeout: 10_000 } as const;

// What a screen reader announces with a field besides its label: the hint and the error, through aria-describedby.
export async function descriptionOf(field: Locator): Promise<string> {
  return field.evaluate((element) =>
    (element.getAttribute("aria-describedby") ?? "")
      .split(/\s+/)
      .filter(Boolean)
      .map((id) => document.getElementById(id)?.textContent ?? "")
      .join(" "),
  );
}

// The message must be tied to this very field (not just somewhere on the page) and the field marked invalid.
export async function expectFieldError(field: Locator, message: string) {
  await expect.poll(() => descriptionOf(field), POLL).toContain(message);
  expect(await field.getAttribute("aria-invalid")).toBe("true");
}

export async function expectFieldValid(field: Locator) {
  await expect.poll(() => field.getAttribute("aria-invalid"), POLL).toBeNull();
}

// Every call a page makes to the app's API or auth endpoints, to show that a form stopped before sending anything.
export function recordApiCalls(page: Page): string[] {
  const calls: string[] = [];
  page.on("request", (request) => {
    const url = new URL(request.url());
    if (url.pathname.startsWith("/api/")) calls.push(`${request.method()} ${url.pathname}`);
  });
  return calls;
}

// Rewrites the JSON a form sends, standing in for someone who switches the browser's checks off.
export async function tamperWithRequests(page: Page, urlPattern: string, body: unknown) {
  await page.route(urlPattern, (route) =>
    route.request().method() === "POST" ? route.continue({ postData: JSON.stringify(body) }) : route.continue(),
  );
}
