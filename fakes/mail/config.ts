import { isIP } from "node:net";
import { resolve } from "node:path";

export const DEFAULT_PORT = 3025;
export const DEFAULT_HOST = "127.0.0.1";
export const DEFAULT_STORE_PATH = ".data/mail-fake.json";

export interface MailFakeConfig {
  port: number;
  host: string;
  apiKey: string;
  storePath: string;
}

export type ConfigResult =
  | { ok: true; config: MailFakeConfig; warnings: string[] }
  | { ok: false; errors: string[] };

type Env = Record<string, string | undefined>;

// An empty assignment in a shell or .env file (`MAIL_FAKE_PORT=`) means "use the default", not "set to nothing".
function valueOf(env: Env, name: string): string | undefined {
  const raw = env[name]?.trim();
  return raw ? raw : undefined;
}

export function isLoopbackHost(host: string): boolean {
  const bare = host.replace(/^\[|\]$/g, "").toLowerCase();
  if (bare === "localhost" || bare === "::1") return true;
  return isIP(bare) === 4 && bare.startsWith("127.");
}

export function readMailFakeConfig(env: Env, cwd = process.cwd()): ConfigResult {
  const errors: string[] = [];
  const warnings: string[] = [];

  const portText = valueOf(env, "MAIL_FAKE_PORT");
  const port = portText === undefined ? DEFAULT_PORT : Number(portText);
  if (portText !== undefined && (!/^\d+$/.test(portText) || port < 1 || port > 65_535)) {
    errors.push(`MAIL_FAKE_PORT must be a whole number from 1 to 65535 (got "${portText}").`);
  }

  const host = valueOf(env, "MAIL_FAKE_HOST") ?? DEFAULT_HOST;
  if (/\s|\//.test(host)) {
    errors.push(`MAIL_FAKE_HOST must be a host name or IP address such as 127.0.0.1 (got "${host}").`);
  } else if (!isLoopbackHost(host)) {
    warnings.push(
      `MAIL_FAKE_HOST is ${host}, which is not a loopback address: anyone who can reach it can read the mailbox without a key.`,
    );
  }

  const apiKey = valueOf(env, "MAIL_FAKE_API_KEY");
  if (apiKey === undefined) {
    errors.push("MAIL_FAKE_API_KEY is required: set it to the same value the app uses as RESEND_API_KEY.");
  } else if (/\s/.test(apiKey)) {
    errors.push("MAIL_FAKE_API_KEY must not contain spaces, because it travels in an Authorization header.");
  }

  const storePath = resolve(cwd, valueOf(env, "MAIL_FAKE_STORE") ?? DEFAULT_STORE_PATH);

  if (errors.length > 0 || apiKey === undefined) return { ok: false, errors };
  return { ok: true, config: { port, host, apiKey, storePath }, warnings };
}
