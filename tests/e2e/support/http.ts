import { clientAddress } from "./browser";
import { APP_URL } from "./env";

// Plain HTTP against the running app, for checks that need status codes rather than a browser.
export async function httpSignIn(email: string, password: string): Promise<string> {
  const response = await fetch(`${APP_URL}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: APP_URL, "x-forwarded-for": clientAddress() },
    body: JSON.stringify({ email, password }),
  });
  if (!response.ok) throw new Error(`Sign-in for ${email} answered ${response.status}`);
  return response.headers
    .getSetCookie()
    .map((cookie) => cookie.split(";")[0])
    .join("; ");
}

export async function httpRequest(method: string, path: string, options: { cookie?: string; body?: unknown } = {}) {
  const response = await fetch(`${APP_URL}${path}`, {
    method,
    redirect: "manual",
    headers: {
      origin: APP_URL,
      ...(options.cookie ? { cookie: options.cookie } : {}),
      ...(options.body !== undefined ? { "content-type": "application/json" } : {}),
    },
    body: options.body !== undefined ? JSON.stringify(options.body) : undefined,
  });
  return { status: response.status, location: response.headers.get("location"), text: await response.text() };
}
