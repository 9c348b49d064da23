import { describe, expect, it } from "vitest";
import type { CreateEmailOptions } from "resend";
import { inspectMessages, sampleEmail, useMailFake } from "./mail-fake-harness";

const DAY_MS = 24 * 60 * 60 * 1000;

describe("Idempotency-Key handling", () => {
  let nowMs = Date.parse("2026-03-02T09:00:00Z");
  const ctx = useMailFake({ now: () => new Date(nowMs) });

  it("returns the first id for a repeat with the same key and payload, storing one copy", async () => {
    const first = await ctx.resend.emails.send(sampleEmail(), { idempotencyKey: "invite/42" });
    const second = await ctx.resend.emails.send(sampleEmail(), { idempotencyKey: "invite/42" });

    expect(first.error).toBeNull();
    expect(second.data?.id).toBe(first.data?.id);
    const stored = await inspectMessages(ctx.fake.url);
    expect(stored).toHaveLength(1);
    expect(stored[0]?.idempotencyKey).toBe("invite/42");
  });

  it("treats concurrent repeats as one request", async () => {
    const results = await Promise.all(
      Array.from({ length: 5 }, () => ctx.resend.emails.send(sampleEmail(), { idempotencyKey: "burst" })),
    );

    expect(new Set(results.map((result) => result.data?.id)).size).toBe(1);
    expect(await inspectMessages(ctx.fake.url)).toHaveLength(1);
  });

  it("answers 409 when the key is reused with a different payload", async () => {
    await ctx.resend.emails.send(sampleEmail(), { idempotencyKey: "invite/43" });
    const clash = await ctx.resend.emails.send(sampleEmail({ subject: "Changed" }), { idempotencyKey: "invite/43" });

    expect(clash.data).toBeNull();
    expect(clash.error).toMatchObject({ statusCode: 409, name: "invalid_idempotent_request" });
    expect(clash.error?.message).toContain("different payload");
    expect(await inspectMessages(ctx.fake.url)).toHaveLength(1);
  });

  it("stores separate messages for the same payload under different keys or none", async () => {
    await ctx.resend.emails.send(sampleEmail(), { idempotencyKey: "a" });
    await ctx.resend.emails.send(sampleEmail(), { idempotencyKey: "b" });
    await ctx.resend.emails.send(sampleEmail());

    expect(await inspectMessages(ctx.fake.url)).toHaveLength(3);
  });

  it("forgets a key after 24 hours but not a millisecond before", async () => {
    const first = await ctx.resend.emails.send(sampleEmail(), { idempotencyKey: "daily" });

    nowMs += DAY_MS - 1;
    const withinWindow = await ctx.resend.emails.send(sampleEmail({ subject: "Later" }), { idempotencyKey: "daily" });
    nowMs += 1;
    const afterWindow = await ctx.resend.emails.send(sampleEmail({ subject: "Later" }), { idempotencyKey: "daily" });

    expect(withinWindow.error).toMatchObject({ statusCode: 409 });
    expect(afterWindow.error).toBeNull();
    expect(afterWindow.data?.id).not.toBe(first.data?.id);
    expect(await inspectMessages(ctx.fake.url)).toHaveLength(2);
  });

  it("does not spend the key on a request that failed validation", async () => {
    const rejected = await ctx.resend.emails.send(
      sampleEmail({ to: [] }) as unknown as CreateEmailOptions,
      { idempotencyKey: "retry-me" },
    );
    const corrected = await ctx.resend.emails.send(sampleEmail(), { idempotencyKey: "retry-me" });

    expect(rejected.error).toMatchObject({ statusCode: 422 });
    expect(corrected.error).toBeNull();
  });

  it("answers 400 for a key longer than 256 characters", async () => {
    const { error } = await ctx.resend.emails.send(sampleEmail(), { idempotencyKey: "k".repeat(257) });
    const longest = await ctx.resend.emails.send(sampleEmail(), { idempotencyKey: "k".repeat(256) });

    expect(error).toMatchObject({ statusCode: 400, name: "invalid_idempotency_key" });
    expect(longest.error).toBeNull();
  });

  it("replays a keyed batch instead of storing it twice", async () => {
    const batch = [sampleEmail({ subject: "One" }), sampleEmail({ subject: "Two" })];
    const first = await ctx.resend.batch.send(batch, { idempotencyKey: "batch-1" });
    const again = await ctx.resend.batch.send(batch, { idempotencyKey: "batch-1" });
    const changed = await ctx.resend.batch.send(batch.slice(0, 1), { idempotencyKey: "batch-1" });

    expect(again.data).toEqual(first.data);
    expect(changed.error).toMatchObject({ statusCode: 409 });
    expect(await inspectMessages(ctx.fake.url)).toHaveLength(2);
  });
});
