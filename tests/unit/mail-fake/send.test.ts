import { createElement } from "react";
import { describe, expect, it } from "vitest";
import { Resend } from "resend";
import { inspectMessages, resendFor, sampleEmail, TEST_KEY, useMailFake } from "./mail-fake-harness";

describe("sending through the real resend SDK", () => {
  const ctx = useMailFake();

  it("stores the message and lists it with its links decoded", async () => {
    const result = await ctx.resend.emails.send({
      ...sampleEmail(),
      cc: ["Carer <carer@example.com>"],
      replyTo: "clinic@example.com",
      tags: [{ name: "kind", value: "invitation" }],
      headers: { "X-Rampline-Test": "yes" },
    });

    expect(result.error).toBeNull();
    const [message] = await inspectMessages(ctx.fake.url);
    expect(message).toMatchObject({
      id: result.data?.id,
      from: "Rampline <no-reply@rampline.test>",
      to: ["ada@example.com"],
      cc: ["Carer <carer@example.com>"],
      replyTo: ["clinic@example.com"],
      subject: "Your Rampline invitation",
      tags: [{ name: "kind", value: "invitation" }],
      headers: { "X-Rampline-Test": "yes" },
      idempotencyKey: null,
    });
    expect(message?.links).toEqual(["http://127.0.0.1:3000/invite?token=abc&clinic=7"]);
  });

  it("lists newest first and filters by any recipient, ignoring case and display names", async () => {
    await ctx.resend.emails.send(sampleEmail({ subject: "First", to: ["ada@example.com", "bo@example.com"] }));
    await ctx.resend.emails.send(sampleEmail({ subject: "Second", to: "bo@example.com" }));
    await ctx.resend.emails.send(sampleEmail({ subject: "Third", to: "cy@example.com", bcc: "Ada <ADA@example.com>" }));

    expect((await inspectMessages(ctx.fake.url)).map((m) => m.subject)).toEqual(["Third", "Second", "First"]);
    expect((await inspectMessages(ctx.fake.url, "ada@example.com")).map((m) => m.subject)).toEqual(["Third", "First"]);
    expect((await inspectMessages(ctx.fake.url, "nobody@example.com"))).toEqual([]);
  });

  it("receives the HTML the SDK renders from a React element", async () => {
    const react = createElement("p", null, createElement("a", { href: "http://127.0.0.1:3000/reset?token=x1&user=2" }, "Reset"));
    const { error } = await ctx.resend.emails.send({ from: "no-reply@rampline.test", to: "ada@example.com", subject: "Reset", react });

    expect(error).toBeNull();
    const [message] = await inspectMessages(ctx.fake.url);
    expect(message?.html).toContain(">Reset</a>");
    expect(message?.links).toEqual(["http://127.0.0.1:3000/reset?token=x1&user=2"]);
  });

  it("answers emails.get in the shape the SDK declares", async () => {
    const sent = await ctx.resend.emails.send(sampleEmail({ to: ["ada@example.com"] }));
    const got = await ctx.resend.emails.get(sent.data?.id ?? "");

    expect(got.error).toBeNull();
    expect(got.data).toMatchObject({
      object: "email",
      id: sent.data?.id,
      to: ["ada@example.com"],
      cc: null,
      subject: "Your Rampline invitation",
      last_event: "delivered",
    });
    expect(Date.parse(got.data?.created_at ?? "")).not.toBeNaN();
  });

  it("reports unknown and malformed ids as SDK errors", async () => {
    const missing = await ctx.resend.emails.get("00000000-0000-4000-8000-000000000000");
    const malformed = await ctx.resend.emails.get("not-a-uuid");

    expect(missing.error).toMatchObject({ statusCode: 404, name: "not_found" });
    expect(malformed.error).toMatchObject({ statusCode: 422, name: "invalid_parameter" });
  });

  it("stores every e-mail of a batch and returns their ids in order", async () => {
    const { data, error } = await ctx.resend.batch.send([
      sampleEmail({ subject: "One" }),
      sampleEmail({ subject: "Two", to: "bo@example.com" }),
    ]);

    expect(error).toBeNull();
    const stored = await inspectMessages(ctx.fake.url);
    expect(data?.data.map((entry) => entry.id)).toEqual([stored[1]?.id, stored[0]?.id]);
    expect(stored.map((m) => m.subject)).toEqual(["Two", "One"]);
  });

  it("is reached because the SDK reads RESEND_BASE_URL when the client is constructed", async () => {
    const client = resendFor(ctx.fake.url);
    const previous = process.env.RESEND_BASE_URL;
    // Changing the variable afterwards must not matter: the client already holds the URL.
    process.env.RESEND_BASE_URL = "http://127.0.0.1:9";
    try {
      expect((await client.emails.send(sampleEmail())).error).toBeNull();
      const late = new Resend(TEST_KEY);
      expect((await late.emails.send(sampleEmail())).error).toMatchObject({ name: "application_error", statusCode: null });
    } finally {
      if (previous === undefined) delete process.env.RESEND_BASE_URL;
      else process.env.RESEND_BASE_URL = previous;
    }
    expect(await inspectMessages(ctx.fake.url)).toHaveLength(1);
  });
});
