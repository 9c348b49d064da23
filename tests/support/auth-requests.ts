// Signs in through better-auth's real HTTP handler and builds requests that carry the session cookie, so route
// handlers can be called in-process exactly as the browser would call them.
import { auth } from "@/lib/auth/server";
import { TEST_PASSWORD } from "./factories";

const BASE = "http://127.0.0.1:3000";
let ipCounter = 0;

// Each sign-in comes from its own documentation-range address so the sign-in rate limit is not shared by tests.
export function testIp(): string {
  ipCounter += 1;
  return `198.51.100.${(process.pid + ipCounter) % 250}`;
}

export async function signIn(email: string, password = TEST_PASSWORD, ip = testIp()): Promise<Response> {
  return auth.handler(
    new Request(`${BASE}/api/auth/sign-in/email`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: BASE, "x-forwarded-for": ip },
      body: JSON.stringify({ email, password }),
    }),
  );
}

export async function sessionCookie(email: string): Promise<string> {
  const response = await signIn(email);
  if (!response.ok) throw new Error(`Sign-in failed for ${email}: ${response.status}`);
  return response.headers
    .getSetCookie()
    .map((cookie) => cookie.split(";")[0])
    .join("; ");
}

export function jsonRequest(path: string, body: unknown, options: { cookie?: string; method?: string; contentType?: string } = {}) {
  return new Request(`${BASE}${path}`, {
    method: options.method ?? "POST",
    headers: {
      "content-type": options.contentType ?? "application/json",
      origin: BASE,
      ...(options.cookie ? { cookie: options.cookie } : {}),
    },
    body: typeof body === "string" ? body : JSON.stringify(body),
  });
}

export function params<P>(value: P) {
  return { params: Promise.resolve(value) };
}
