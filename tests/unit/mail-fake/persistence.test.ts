import { mkdtemp, readdir, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import type { MailFake } from "@/fakes/mail/app";
import { inspectMessages, resendFor, sampleEmail, startFake, useMailFake } from "./mail-fake-harness";

describe("the store file", () => {
  let dir: string;
  let running: MailFake[];

  beforeEach(async () => {
    dir = await mkdtemp(join(tmpdir(), "rampline-mail-store-"));
    running = [];
  });
  afterEach(async () => {
    await Promise.all(running.map((fake) => fake.close()));
    await rm(dir, { recursive: true, force: true });
  });

  const start = async (storePath: string) => {
    const fake = await startFake(storePath);
    running.push(fake);
    return fake;
  };

  it("keeps messages and idempotency keys across a restart on the same file", async () => {
    const storePath = join(dir, "nested", "folder", "mail.json");
    const first = await start(storePath);
    const sent = await resendFor(first.url).emails.send(sampleEmail(), { idempotencyKey: "survives" });
    await first.close();

    const second = await start(storePath);
    const resend = resendFor(second.url);
    const replay = await resend.emails.send(sampleEmail(), { idempotencyKey: "survives" });

    expect((await inspectMessages(second.url)).map((m) => m.id)).toEqual([sent.data?.id]);
    expect((await resend.emails.get(sent.data?.id ?? "")).data?.subject).toBe("Your Rampline invitation");
    expect(replay.data?.id).toBe(sent.data?.id);
  });

  it("leaves only the store file behind after many quick writes", async () => {
    const storePath = join(dir, "mail.json");
    const fake = await start(storePath);
    const resend = resendFor(fake.url);
    await Promise.all(Array.from({ length: 10 }, (_, i) => resend.emails.send(sampleEmail({ subject: `No. ${i}` }))));
    await fake.close();

    expect(await readdir(dir)).toEqual(["mail.json"]);
    expect((await start(storePath)).messages()).toHaveLength(10);
  });

  it("refuses to start on a file that is not JSON, rather than overwriting it", async () => {
    const storePath = join(dir, "mail.json");
    await writeFile(storePath, "{ truncated");

    await expect(startFake(storePath)).rejects.toThrow(/is not valid JSON/);
  });

  it("refuses to start on JSON of the wrong shape", async () => {
    const storePath = join(dir, "mail.json");
    await writeFile(storePath, JSON.stringify({ version: 1, messages: [{ id: 1 }], idempotency: [] }));

    await expect(startFake(storePath)).rejects.toThrow(/not in the expected format/);
  });
});

describe("DELETE /api/messages", () => {
  const ctx = useMailFake();

  it("empties the mailbox, on disk too, and frees idempotency keys", async () => {
    await ctx.resend.emails.send(sampleEmail(), { idempotencyKey: "reused" });
    await ctx.resend.emails.send(sampleEmail({ subject: "Another" }));

    const res = await fetch(`${ctx.fake.url}/api/messages`, { method: "DELETE" });
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ deleted: 2 });
    expect(await inspectMessages(ctx.fake.url)).toEqual([]);

    const reused = await ctx.resend.emails.send(sampleEmail({ subject: "Fresh" }), { idempotencyKey: "reused" });
    expect(reused.error).toBeNull();

    await ctx.fake.close();
    ctx.fake = await startFake(ctx.storePath);
    expect(ctx.fake.messages().map((m) => m.subject)).toEqual(["Fresh"]);
  });
});
