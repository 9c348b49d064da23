import { randomUUID } from "node:crypto";
import { checkApiKey } from "./auth";
import { checkEmailBody } from "./email-schema";
import { HttpError, discardBody, readJsonBody, sendError, sendJson } from "./http-io";
import { checkIdempotency, fingerprintOf, idempotencyKeyOf } from "./idempotency";
import type { Route, RouteContext } from "./router";
import type { StoredMessage } from "./store-schema";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const MAX_BATCH = 100;

async function authorised(ctx: RouteContext): Promise<boolean> {
  const refusal = checkApiKey(ctx.req, ctx.deps.apiKey);
  if (!refusal) return true;
  await discardBody(ctx.req, ctx.deps.maxBodyBytes);
  sendError(ctx.res, refusal);
  return false;
}

function stamp(draft: Omit<StoredMessage, "id" | "createdAt" | "idempotencyKey">, ctx: RouteContext, key: string | null): StoredMessage {
  return { id: randomUUID(), ...draft, idempotencyKey: key, createdAt: ctx.deps.now().toISOString() };
}

// Control characters are flattened so a crafted subject cannot forge extra lines in the log.
const oneLine = (value: string) => value.replace(/[\u0000-\u001f\u007f]+/g, " ");

function logStored(ctx: RouteContext, messages: StoredMessage[]): void {
  for (const message of messages) ctx.deps.log(oneLine(`mail ${message.id} to ${message.to.join(", ")}: ${message.subject}`));
}

async function sendOne(ctx: RouteContext): Promise<void> {
  if (!(await authorised(ctx))) return;
  const key = idempotencyKeyOf(ctx.req);
  const body = await readJsonBody(ctx.req, ctx.deps.maxBodyBytes);
  const fingerprint = fingerprintOf(body);
  const decision = checkIdempotency(ctx.deps.store, "email", key, fingerprint);
  if (decision.kind === "replay") {
    await ctx.deps.store.flush();
    return sendJson(ctx.res, 200, decision.response);
  }

  const checked = checkEmailBody(body);
  if (!checked.ok) throw new HttpError(422, "validation_error", `The e-mail was not accepted: ${checked.problems.join("; ")}.`);

  const message = stamp(checked.message, ctx, key);
  const response = { id: message.id };
  const record = key === null ? undefined : { scope: "email" as const, key, fingerprint, response, createdAt: message.createdAt };
  await ctx.deps.store.add([message], record);
  logStored(ctx, [message]);
  sendJson(ctx.res, 200, response);
}

async function sendBatch(ctx: RouteContext): Promise<void> {
  if (!(await authorised(ctx))) return;
  const key = idempotencyKeyOf(ctx.req);
  const mode = ctx.req.headers["x-batch-validation"] ?? "strict";
  if (mode !== "strict" && mode !== "permissive") {
    throw new HttpError(422, "validation_error", 'The x-batch-validation header must be "strict" or "permissive".');
  }
  const body = await readJsonBody(ctx.req, ctx.deps.maxBodyBytes);
  // The mode changes the outcome, so it is part of what makes two keyed batch requests "the same".
  const fingerprint = fingerprintOf({ mode, body });
  const decision = checkIdempotency(ctx.deps.store, "batch", key, fingerprint);
  if (decision.kind === "replay") {
    await ctx.deps.store.flush();
    return sendJson(ctx.res, 200, decision.response);
  }
  if (!Array.isArray(body) || body.length < 1 || body.length > MAX_BATCH) {
    throw new HttpError(422, "validation_error", `A batch must be a JSON array of 1 to ${MAX_BATCH} e-mails.`);
  }

  const results = body.map((item: unknown, index) => ({ index, checked: checkEmailBody(item) }));
  const errors = results.flatMap(({ index, checked }) =>
    checked.ok ? [] : [{ index, message: `The e-mail was not accepted: ${checked.problems.join("; ")}.` }],
  );
  if (mode === "strict" && errors.length > 0) {
    const detail = errors.map((error) => `[${error.index}] ${error.message}`).join(" ");
    throw new HttpError(422, "validation_error", `No e-mails in the batch were sent. ${detail}`);
  }

  const messages = results.flatMap(({ checked }) => (checked.ok ? [stamp(checked.message, ctx, key)] : []));
  const data = messages.map((message) => ({ id: message.id }));
  const response = mode === "permissive" ? { data, errors } : { data };
  const createdAt = ctx.deps.now().toISOString();
  await ctx.deps.store.add(messages, key === null ? undefined : { scope: "batch", key, fingerprint, response, createdAt });
  logStored(ctx, messages);
  sendJson(ctx.res, 200, response);
}

async function getOne(ctx: RouteContext): Promise<void> {
  if (!(await authorised(ctx))) return;
  const id = ctx.params[0] ?? "";
  if (!UUID.test(id)) throw new HttpError(422, "invalid_parameter", "The e-mail id must be a UUID.");
  const message = ctx.deps.store.get(id);
  if (!message) throw new HttpError(404, "not_found", `No e-mail with id ${id} has been received.`);
  const list = (values: string[]) => (values.length > 0 ? values : null);
  sendJson(ctx.res, 200, {
    object: "email",
    id: message.id,
    from: message.from,
    to: message.to,
    cc: list(message.cc),
    bcc: list(message.bcc),
    reply_to: list(message.replyTo),
    subject: message.subject,
    html: message.html,
    text: message.text,
    tags: message.tags,
    created_at: message.createdAt,
    scheduled_at: message.scheduledAt,
    // Nothing is really delivered; "delivered" is what code waiting on a send expects to see eventually.
    last_event: message.scheduledAt ? "scheduled" : "delivered",
    message_id: `<${message.id}@mail-fake.invalid>`,
  });
}

export const emailRoutes: readonly Route[] = [
  { method: "POST", pattern: /^\/emails\/?$/, handle: sendOne },
  { method: "POST", pattern: /^\/emails\/batch\/?$/, handle: sendBatch },
  { method: "GET", pattern: /^\/emails\/([^/]+)\/?$/, handle: getOne },
];
