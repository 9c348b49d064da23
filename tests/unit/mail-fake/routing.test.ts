import { describe, expect, it } from "vitest";
import { inspectMessages, rawRequest, sampleEmail, useMailFake } from "./mail-fake-harness";

describe("routing", () => {
  const ctx = useMailFake();

  it("answers /health with the message count", async () => {
    await ctx.resend.emails.send(sampleEmail());
    const res = await fetch(`${ctx.fake.url}/health`);

    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ status: "ok", messages: 1 });
  });

  it("serves one inspected message by id, links included", async () => {
    const { data } = await ctx.resend.emails.send(sampleEmail());
    const res = await fetch(`${ctx.fake.url}/api/messages/${data?.id ?? ""}`);

    expect(res.status).toBe(200);
    expect(await res.json()).toEqual((await inspectMessages(ctx.fake.url))[0]);
  });

  it("answers 405 with an Allow header for a known path and the wrong method", async () => {
    const res = await rawRequest(ctx.fake.url, { method: "PUT", path: "/emails", headers: { "user-agent": "t" } });

    expect(res.status).toBe(405);
    expect(res.headers.allow).toBe("POST");
    expect(JSON.parse(res.body)).toMatchObject({ statusCode: 405, name: "method_not_allowed" });
  });

  it("answers 404 in the SDK's error shape for an unknown path", async () => {
    const res = await fetch(`${ctx.fake.url}/domains`);

    expect(res.status).toBe(404);
    expect(await res.json()).toEqual({ statusCode: 404, name: "not_found", message: "Nothing is served at /domains." });
  });

  it("refuses a malformed recipient filter instead of returning nothing", async () => {
    const res = await fetch(`${ctx.fake.url}/api/messages?to=not-an-address`);

    expect(res.status).toBe(422);
  });
});
