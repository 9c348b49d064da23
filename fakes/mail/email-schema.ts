import { z } from "zod";
import type { StoredMessage } from "./store-schema";

const BARE_ADDRESS = /^[^\s@<>"(),;:]+@[^\s@<>"(),;:]+\.[^\s@<>"(),;:]+$/;

/** The bare, lower-cased address of `ada@example.com` or `Ada Lovelace <Ada@Example.com>`; null if it is neither. */
export function addressOf(value: string): string | null {
  const match = /^\s*(?:[^<>]*<([^<>]+)>|([^<>]+))\s*$/.exec(value);
  const bare = (match?.[1] ?? match?.[2] ?? "").trim();
  return BARE_ADDRESS.test(bare) ? bare.toLowerCase() : null;
}

const requiredText = (what: string) =>
  z.string({ error: (issue) => (issue.input === undefined ? "is required" : `must be ${what}`) });

const address = requiredText("an e-mail address").refine((value) => addressOf(value) !== null, {
  error: 'must be an address such as ada@example.com or "Ada <ada@example.com>"',
});

// The SDK passes `to`, `cc`, `bcc` and `reply_to` through as given, so each may be one string or a list.
const addressList = (max: number) =>
  z.preprocess(
    (value) => (typeof value === "string" ? [value] : value),
    z
      .array(address, { error: (issue) => (issue.input === undefined ? "is required" : "must be an address or a list of addresses") })
      .min(1, { error: "must contain at least one address" })
      .max(max, { error: `may contain at most ${max} addresses` }),
  );

const tagPart = z.string().regex(/^[A-Za-z0-9_-]{1,256}$/, {
  error: "may only use letters, digits, underscores and hyphens (1 to 256 of them)",
});

export const emailBodySchema = z.object({
  from: address,
  to: addressList(50),
  cc: addressList(50).optional(),
  bcc: addressList(50).optional(),
  reply_to: addressList(50).optional(),
  subject: requiredText("text").refine((value) => value.trim() !== "", { error: "must not be empty" }),
  html: z.string({ error: "must be text" }).optional(),
  text: z.string({ error: "must be text" }).optional(),
  tags: z.array(z.object({ name: tagPart, value: tagPart })).optional(),
  headers: z.record(z.string(), z.string(), { error: "must be an object of text values" }).optional(),
  scheduled_at: z.string({ error: "must be text" }).optional(),
  attachments: z
    .array(z.object({ filename: z.union([z.string(), z.literal(false)]).optional(), content_type: z.string().optional() }))
    .optional(),
});

function pathLabel(path: readonly PropertyKey[]): string {
  return path.reduce<string>((label, part) => (typeof part === "number" ? `${label}[${part}]` : label ? `${label}.${String(part)}` : String(part)), "");
}

export type EmailCheck = { ok: true; message: Omit<StoredMessage, "id" | "createdAt" | "idempotencyKey"> } | { ok: false; problems: string[] };

export function checkEmailBody(body: unknown): EmailCheck {
  if (typeof body !== "object" || body === null || Array.isArray(body)) {
    return { ok: false, problems: ["the body must be a JSON object describing one e-mail"] };
  }
  const raw = body as Record<string, unknown>;
  const problems: string[] = [];
  if (raw.template !== undefined) problems.push("template: stored templates are not supported by the mail fake; send html or text");
  const hasContent = (value: unknown) => typeof value === "string" && value.trim() !== "";
  if (!hasContent(raw.html) && !hasContent(raw.text)) problems.push("html/text: at least one of them must be given");

  const parsed = emailBodySchema.safeParse(body);
  // A lone address is wrapped in a list before checking; its problems are reported against the field, not "[0]".
  const label = (path: readonly PropertyKey[]) =>
    pathLabel(typeof path[0] === "string" && typeof raw[path[0]] === "string" && path[1] === 0 ? [path[0]] : path) || "body";
  if (!parsed.success) problems.unshift(...parsed.error.issues.map((issue) => `${label(issue.path)}: ${issue.message}`));
  if (!parsed.success || problems.length > 0) return { ok: false, problems };

  const data = parsed.data;
  return {
    ok: true,
    message: {
      from: data.from,
      to: data.to,
      cc: data.cc ?? [],
      bcc: data.bcc ?? [],
      replyTo: data.reply_to ?? [],
      subject: data.subject,
      html: data.html ?? null,
      text: data.text ?? null,
      tags: data.tags ?? [],
      headers: data.headers ?? {},
      attachments: (data.attachments ?? []).map((file) => ({
        filename: typeof file.filename === "string" ? file.filename : null,
        contentType: file.content_type ?? null,
      })),
      scheduledAt: data.scheduled_at ?? null,
    },
  };
}
