import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import type { AddressInfo } from "node:net";
import { DEFAULT_HOST, DEFAULT_PORT } from "./config";
import { emailRoutes } from "./email-routes";
import { checkHost } from "./host-guard";
import { HttpError, discardBody, sendError } from "./http-io";
import { IDEMPOTENCY_TTL_MS } from "./idempotency";
import { inspectRoutes } from "./inspect-routes";
import { mailboxRoutes } from "./mailbox-routes";
import { dispatch, type AppDeps } from "./router";
import { openMessageStore } from "./store";
import type { StoredMessage } from "./store-schema";

export const DEFAULT_MAX_BODY_BYTES = 2 * 1_048_576;

export interface MailFakeOptions {
  apiKey: string;
  storePath: string;
  /** 0 picks a free port, which is what tests want. */
  port?: number;
  host?: string;
  maxBodyBytes?: number;
  /** Replaceable so tests can move past the 24-hour idempotency window without waiting. */
  now?: () => Date;
  log?: (line: string) => void;
}

export interface MailFake {
  /** Base URL without a trailing slash: the SDK appends paths such as `/emails` to RESEND_BASE_URL verbatim. */
  url: string;
  port: number;
  storePath: string;
  /** Newest first. */
  messages(): StoredMessage[];
  clear(): Promise<void>;
  close(): Promise<void>;
}

const routes = [...emailRoutes, ...inspectRoutes, ...mailboxRoutes];

async function handle(req: IncomingMessage, res: ServerResponse, deps: AppDeps, host: string): Promise<void> {
  try {
    const refusal = checkHost(req, host);
    if (refusal) throw refusal;
    const url = new URL(req.url ?? "/", "http://mail-fake.invalid");
    await dispatch(routes, { req, res, url, deps });
  } catch (error) {
    const known = error instanceof HttpError;
    if (!known) deps.log(`unexpected error on ${req.method} ${req.url}: ${error instanceof Error ? error.stack : String(error)}`);
    if (res.headersSent) return void res.destroy();
    // An unread body would otherwise be cut off mid-upload, which clients report as a network failure.
    if (!req.complete) await discardBody(req, deps.maxBodyBytes);
    sendError(res, known ? error : new HttpError(500, "application_error", "The mail fake failed unexpectedly; its log has the details."));
  }
}

export async function createMailFake(options: MailFakeOptions): Promise<MailFake> {
  const host = options.host ?? DEFAULT_HOST;
  const now = options.now ?? (() => new Date());
  const store = await openMessageStore({ path: options.storePath, now, idempotencyTtlMs: IDEMPOTENCY_TTL_MS });
  const deps: AppDeps = {
    store,
    apiKey: options.apiKey,
    maxBodyBytes: options.maxBodyBytes ?? DEFAULT_MAX_BODY_BYTES,
    now,
    log: options.log ?? (() => undefined),
  };

  const server = createServer((req, res) => {
    handle(req, res, deps, host).catch(() => res.destroy());
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", (error: NodeJS.ErrnoException) =>
      reject(error.code === "EADDRINUSE" ? new Error(`Port ${options.port ?? DEFAULT_PORT} on ${host} is already in use.`) : error),
    );
    server.listen(options.port ?? DEFAULT_PORT, host, () => resolve());
  });

  const { port } = server.address() as AddressInfo;
  const urlHost = host.includes(":") ? `[${host}]` : host;
  let closing: Promise<void> | undefined;

  return {
    url: `http://${urlHost}:${port}`,
    port,
    storePath: options.storePath,
    messages: () => store.list(),
    clear: async () => void (await store.clear()),
    close() {
      closing ??= new Promise<void>((resolve, reject) => {
        server.close((error) => (error ? reject(error) : resolve()));
        // Keep-alive sockets from the SDK's fetch would otherwise hold close() open for several seconds.
        server.closeIdleConnections();
      }).then(() => store.flush());
      return closing;
    },
  };
}
