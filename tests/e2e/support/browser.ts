import { chromium, type Browser, type BrowserContext, type BrowserContextOptions } from "playwright-core";
import { APP_URL, CHROMIUM_PATH } from "./env";

// Debian's Chromium, never a downloaded browser. As root it needs --no-sandbox; the other flags stop it reaching
// for the network, which this machine does not have.
export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
      "--no-first-run",
      "--disable-dev-shm-usage",
    ],
  });
}

let addressCounter = 0;

// Each browser context presents its own documentation-range client address, the way separate people would, so the
// per-address sign-in rate limit is exercised as in production instead of being shared by the whole suite.
export function clientAddress(): string {
  addressCounter += 1;
  return `192.0.2.${((process.pid * 7 + addressCounter) % 250) + 1}`;
}

export async function newContext(browser: Browser, options: BrowserContextOptions = {}): Promise<BrowserContext> {
  const context = await browser.newContext({
    baseURL: APP_URL,
    locale: "en-GB",
    timezoneId: "Europe/London",
    ...options,
    extraHTTPHeaders: { "x-forwarded-for": clientAddress(), ...(options.extraHTTPHeaders ?? {}) },
  });
  context.setDefaultTimeout(15_000);
  return context;
}
