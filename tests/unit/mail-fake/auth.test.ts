import { describe, expect, it } from "vitest";
import { inspectMessages, rawRequest, resendFor, sampleEmail, TEST_KEY, useMailFake } from "./mail-fake-harness";

const jsonHeaders = { "content-type": "application/json", "user-agent": "rampline-test" };

describe("API key checks", () => {
  const ctx = useMailFake();

  it("answers 401 missing_api_key when no Authorization header is sent", async () => {
    const res = await rawRequest(ctx.fake.url, {
      method: "POST",
      path: "/emails",
      headers: jsonHeaders,
      body: JSON.stringify(sampleEmail()),
    });

    expect(res.status).toBe(401);
    expect(JSON.parse(res.body)).toEqual({
      statusCode: 401,
      name: "missing_api_key",
      message: "No API key was sent. Add the header `Authorization: Bearer <key>`.",
    });
    expect(await inspectMessages(ctx.fake.url)).toEqual([]);
  });

  it("hands the SDK caller a 403 error object, not an exception, for a wrong key", async () => {
    const wrong = resendFor(ctx.fake.url, "re_not_the_key");
    const result = await wrong.emails.send(sampleEmail());

    expect(result.data).toBeNull();
    expect(result.error).toEqual({
      statusCode: 403,
      name: "invalid_api_key",
      message: "The API key is not the one this mail fake was started with.",
    });
    expect(await inspectMessages(ctx.fake.url)).toEqual([]);
  });

  it("refuses a key sent with another scheme than Bearer", async () => {
    const res = await rawRequest(ctx.fake.url, {
      method: "POST",
      path: "/emails",
      headers: { ...jsonHeaders, authorization: `Basic ${TEST_KEY}` },
      body: JSON.stringify(sampleEmail()),
    });

    expect(res.status).toBe(403);
    expect(JSON.parse(res.body)).toMatchObject({ name: "invalid_api_key" });
  });

  it("requires the key to read a message back through the SDK's get", async () => {
    const sent = await ctx.resend.emails.send(sampleEmail());
    const path = `/emails/${sent.data?.id ?? ""}`;

    const anonymous = await rawRequest(ctx.fake.url, { method: "GET", path, headers: { "user-agent": "rampline-test" } });
    const wrong = await resendFor(ctx.fake.url, "re_wrong").emails.get(sent.data?.id ?? "");

    expect(anonymous.status).toBe(401);
    expect(wrong.error).toMatchObject({ statusCode: 403, name: "invalid_api_key" });
  });

  it("refuses a correctly keyed request without a User-Agent, as the hosted service does", async () => {
    const res = await rawRequest(ctx.fake.url, {
      method: "POST",
      path: "/emails",
      headers: { "content-type": "application/json", authorization: `Bearer ${TEST_KEY}` },
      body: JSON.stringify(sampleEmail()),
    });

    expect(res.status).toBe(403);
    expect(JSON.parse(res.body)).toMatchObject({ message: "Requests must include a User-Agent header." });
  });

  it("ignores requests addressed to a foreign host name, which is what a DNS-rebinding page would send", async () => {
    const res = await rawRequest(ctx.fake.url, { method: "GET", path: "/api/messages", headers: { host: "evil.example:3025" } });
    const local = await rawRequest(ctx.fake.url, { method: "GET", path: "/api/messages", headers: { host: "localhost:3025" } });

    expect(res.status).toBe(403);
    expect(local.status).toBe(200);
  });
});
