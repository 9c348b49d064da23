import type { Locator } from "playwright-core";

// Until React has hydrated an element its handlers are not attached: a form would be sent the browser's own way
// and a button would do nothing. React marks the elements it has hydrated with its own property keys, so the
// tests wait for those before they type or click, rather than racing the scripts on a busy machine. (Plain
// Playwright waiting, not expect.poll, so that it also works in beforeAll.)
export async function whenInteractive(element: Locator): Promise<Locator> {
  const handle = await element.elementHandle();
  await element
    .page()
    .waitForFunction((node) => Object.keys(node ?? {}).some((key) => key.startsWith("__reactProps")), handle, { timeout: 15_000 });
  await handle?.dispose();
  return element;
}

export function formAround(field: Locator): Locator {
  return field.locator("xpath=ancestor::form[1]");
}
