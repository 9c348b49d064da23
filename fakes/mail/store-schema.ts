import { z } from "zod";

// The store file is read back on start, so its shape is checked rather than trusted: a hand-edited or truncated file
// should stop the fake with a clear message instead of surfacing later as a broken mailbox page.

export const tagSchema = z.object({ name: z.string(), value: z.string() });

export const storedMessageSchema = z.object({
  id: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  cc: z.array(z.string()),
  bcc: z.array(z.string()),
  replyTo: z.array(z.string()),
  subject: z.string(),
  html: z.string().nullable(),
  text: z.string().nullable(),
  tags: z.array(tagSchema),
  headers: z.record(z.string(), z.string()),
  attachments: z.array(z.object({ filename: z.string().nullable(), contentType: z.string().nullable() })),
  scheduledAt: z.string().nullable(),
  idempotencyKey: z.string().nullable(),
  createdAt: z.string(),
});

export const idempotencyRecordSchema = z.object({
  // Single sends and batches are separate endpoints, so the same key may be used once on each.
  scope: z.enum(["email", "batch"]),
  key: z.string(),
  fingerprint: z.string(),
  response: z.unknown(),
  createdAt: z.string(),
});

export const storeFileSchema = z.object({
  version: z.literal(1),
  messages: z.array(storedMessageSchema),
  idempotency: z.array(idempotencyRecordSchema),
});

export type Tag = z.infer<typeof tagSchema>;
export type StoredMessage = z.infer<typeof storedMessageSchema>;
export type IdempotencyRecord = z.infer<typeof idempotencyRecordSchema>;
export type IdempotencyScope = IdempotencyRecord["scope"];
export type StoreFile = z.infer<typeof storeFileSchema>;
