import { request } from "node:http";
import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { Resend } from "resend";
import { afterEach, beforeEach } from "vitest";
import { createMailFake, type MailFake, type MailFakeOptions } from "@/fakes/mail/app";
import type { InspectedMessage } from "@/fakes/mail/inspect-routes";

export const TEST_KEY = "re_local_test_key";

export function sampleEmail(overrides: Record<string, unknown> = {}) {
  return {
    from: "Rampline <no-reply@rampline.test>",
    to: "ada@example.com",
    subject: "Your Rampline invitation",
    html: '<p>Hello.</p><p><a href="http://127.0.0.1:3000/invite?token=abc&amp;clinic=7">Accept the invitation</a></p>',
    text: "Hello. Accept the invitation: http://127.0.0.1:3000/invite?token=abc&clinic=7",
    ...overrides,
  };
}

/**
 * The SDK copies RESEND_BASE_URL into the client inside its constructor, so the variable only has to be set while
 * `new Resend` runs; restoring it afterwards keeps tests from leaking configuration into each other.
 */
export function resendFor(url: string, key = TEST_KEY): Resend {
  const previous = process.env.RESEND_BASE_URL;
  process.env.RESEND_BASE_URL = url;
  try {
    return new Resend(key);
  } finally {
    if (previous === undefined) delete process.env.RESEND_BASE_URL;
    else process.env.RESEND_BASE_URL = previous;
  }
}

export async function startFake(storePath: string, extra: Partial<MailFakeOptions> = {}): Promise<MailFake> {
  return createMailFake({ apiKey: TEST_KEY, storePath, port: 0, host: "127.0.0.1", ...extra });
}

export interface FakeContext {
  fake: MailFake;
  resend: Resend;
  dir: string;
  storePath: string;
}

/** A fresh fake with its own store file for every test. */
export function useMailFake(extra: Partial<MailFakeOptions> = {}): FakeContext {
  const ctx = {} as FakeContext;
  beforeEach(async () => {
    ctx.dir = await mkdtemp(join(tmpdir(), "rampline-mail-fake-"));
    ctx.storePath = join(ctx.dir, "mail.json");
    ctx.fake = await startFake(ctx.storePath, extra);
    ctx.resend = resendFor(ctx.fake.url);
  });
  afterEach(async () => {
    await ctx.fake.close();
    await rm(ctx.dir, { recursive: true, force: true });
  });
  return ctx;
}

export async function inspectMessages(url: string, to?: string): Promise<InspectedMessage[]> {
  const query = to === undefined ? "" : `?to=${encodeURIComponent(to)}`;
  const res = await fetch(`${url}/api/messages${query}`);
  if (!res.ok) throw new Error(`GET /api/messages answered ${res.status}`);
  return ((await res.json()) as { messages: InspectedMessage[] }).messages;
}

export interface RawResponse {
  status: number;
  headers: Record<string, string | string[] | undefined>;
  body: string;
}

/** node:http rather than fetch, because fetch always adds a User-Agent and will not send a forged Host header. */
export function rawRequest(
  url: string,
  options: { method: string; path: string; headers?: Record<string, string>; body?: string },
): Promise<RawResponse> {
  return new Promise((resolve, reject) => {
    const req = request(`${url}${options.path}`, { method: options.method, headers: options.headers }, (res) => {
      let body = "";
      res.setEncoding("utf8");
      res.on("data", (chunk: string) => (body += chunk));
      res.on("end", () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body }));
    });
    req.on("error", reject);
    req.end(options.body);
  });
}
