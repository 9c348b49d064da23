import AxeBuilder from "@axe-core/playwright";
import type { Page } from "playwright-core";

// Collects Content-Security-Policy violations two ways: Chromium's console report, and the page's own
// securitypolicyviolation events (recorded by a script that runs before any of the page's scripts).
export async function watchCspViolations(page: Page): Promise<() => Promise<string[]>> {
  const fromConsole: string[] = [];
  page.on("console", (message) => {
    const text = message.text();
    if (/Content Security Policy|Refused to/i.test(text)) fromConsole.push(text);
  });
  await page.addInitScript(() => {
    const store = window as unknown as { cspViolations: string[] };
    store.cspViolations = [];
    document.addEventListener("securitypolicyviolation", (event) => {
      const where = event.sourceFile ? ` (from ${event.sourceFile}:${event.lineNumber}:${event.columnNumber})` : "";
      store.cspViolations.push(`${event.violatedDirective} blocked ${event.blockedURI || "inline code"}${where}`);
    });
  });
  return async () => {
    const fromEvents = await page.evaluate(() => (window as unknown as { cspViolations?: string[] }).cspViolations ?? []);
    return [...fromConsole, ...fromEvents];
  };
}

export function directive(csp: string, name: string): string | undefined {
  return csp
    .split(";")
    .map((part) => part.trim())
    .find((part) => part === name || part.startsWith(`${name} `));
}

export function scriptNonce(csp: string): string | undefined {
  return directive(csp, "script-src")?.match(/'nonce-([A-Za-z0-9+/=_-]+)'/)?.[1];
}

// Every script element the server sent must carry the nonce, or the browser would refuse to run it.
export function scriptTagsWithoutNonce(html: string, nonce: string): string[] {
  return (html.match(/<script\b[^>]*>/g) ?? []).filter((tag) => !tag.includes(`nonce="${nonce}"`));
}

// One line per problem axe finds, readable in a failure message: rule, impact, help text and where.
export async function accessibilityProblems(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page }).analyze();
  return results.violations.map(
    (violation) =>
      `${violation.id} (${violation.impact ?? "unknown"}): ${violation.help} at ${violation.nodes.map((node) => node.target.join(" ")).join(", ")}`,
  );
}
