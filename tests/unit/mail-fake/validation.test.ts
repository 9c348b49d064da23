import { describe, expect, it } from "vitest";
import type { CreateEmailOptions } from "resend";
import { inspectMessages, rawRequest, sampleEmail, TEST_KEY, useMailFake } from "./mail-fake-harness";

// Casts let the tests send what the SDK's types would reject, as a plain-JavaScript caller could.
const loose = (value: Record<string, unknown>) => value as unknown as CreateEmailOptions;

describe("request body validation", () => {
  const ctx = useMailFake();

  it.each([
    ["an empty recipient list", { to: [] }, "to: must contain at least one address"],
    ["a malformed recipient", { to: ["ada@example.com", "not an address"] }, "to[1]: must be an address"],
    ["a missing sender", { from: undefined }, "from: is required"],
    ["a blank subject", { subject: "  " }, "subject: must not be empty"],
    ["neither html nor text", { html: undefined, text: "" }, "html/text: at least one of them must be given"],
    ["a tag with a space in it", { tags: [{ name: "kind", value: "an invite" }] }, "tags[0].value: may only use"],
    ["a stored template", { template: { id: "welcome" } }, "template: stored templates are not supported"],
  ])("answers 422 for %s", async (_label, overrides, expected) => {
    const { data, error } = await ctx.resend.emails.send(loose(sampleEmail(overrides)));

    expect(data).toBeNull();
    expect(error).toMatchObject({ statusCode: 422, name: "validation_error" });
    expect(error?.message).toContain(expected);
    expect(await inspectMessages(ctx.fake.url)).toEqual([]);
  });

  it("accepts a single address string and stores it as a one-item list", async () => {
    await ctx.resend.emails.send(sampleEmail({ to: "Ada Lovelace <ada@example.com>", html: undefined }));

    const [message] = await inspectMessages(ctx.fake.url);
    expect(message?.to).toEqual(["Ada Lovelace <ada@example.com>"]);
    expect(message?.html).toBeNull();
  });

  it("answers 400 for a body that is not JSON", async () => {
    const res = await rawRequest(ctx.fake.url, {
      method: "POST",
      path: "/emails",
      headers: { authorization: `Bearer ${TEST_KEY}`, "user-agent": "rampline-test", "content-type": "application/json" },
      body: "{ not json",
    });

    expect(res.status).toBe(400);
    expect(JSON.parse(res.body)).toMatchObject({ name: "validation_error", message: "The request body is not valid JSON." });
  });

  it("answers 413 through the SDK for a body over 2 MiB and stores nothing", async () => {
    const html = `<p>${"x".repeat(2 * 1_048_576)}</p>`;
    const { error } = await ctx.resend.emails.send(sampleEmail({ html }));

    expect(error).toEqual({ statusCode: 413, name: "validation_error", message: "The request body is larger than the limit of 2 MiB." });
    expect(await inspectMessages(ctx.fake.url)).toEqual([]);
  });

  it("refuses a whole strict batch when one e-mail is invalid", async () => {
    const { error } = await ctx.resend.batch.send([sampleEmail(), loose(sampleEmail({ to: "nobody" }))]);

    expect(error).toMatchObject({ statusCode: 422, name: "validation_error" });
    expect(error?.message).toContain("[1] The e-mail was not accepted: to: must be an address");
    expect(await inspectMessages(ctx.fake.url)).toEqual([]);
  });

  it("stores the valid part of a permissive batch and reports the rest by index", async () => {
    const { data, error } = await ctx.resend.batch.send(
      [loose(sampleEmail({ subject: "" })), sampleEmail({ subject: "Kept" })],
      { batchValidation: "permissive" },
    );

    expect(error).toBeNull();
    const stored = await inspectMessages(ctx.fake.url);
    expect(stored.map((m) => m.subject)).toEqual(["Kept"]);
    expect(data?.data).toEqual([{ id: stored[0]?.id }]);
    expect(data?.errors).toEqual([{ index: 0, message: expect.stringContaining("subject: must not be empty") }]);
  });
});

describe("the body size limit", () => {
  const ctx = useMailFake({ maxBodyBytes: 1_024 });

  // Whitespace padding keeps the JSON valid, so the size is the only thing that differs between the two requests.
  const paddedTo = (size: number) => {
    const json = JSON.stringify(sampleEmail());
    return json.slice(0, -1) + " ".repeat(size - json.length) + "}";
  };
  const post = (body: string) =>
    rawRequest(ctx.fake.url, {
      method: "POST",
      path: "/emails",
      headers: { authorization: `Bearer ${TEST_KEY}`, "user-agent": "rampline-test", "content-type": "application/json" },
      body,
    });

  it("accepts a body of exactly the limit and refuses one byte more", async () => {
    expect((await post(paddedTo(1_024))).status).toBe(200);
    const over = await post(paddedTo(1_025));

    expect(over.status).toBe(413);
    expect(JSON.parse(over.body)).toMatchObject({ message: "The request body is larger than the limit of 1024 bytes." });
  });
});
