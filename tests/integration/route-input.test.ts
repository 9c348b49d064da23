import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { POST as inviteCarerRoute } from "@/app/api/clients/[clientId]/carers/route";
import { POST as inviteClientRoute } from "@/app/api/clients/route";
import { POST as acceptRoute } from "@/app/api/invitations/[invitationId]/accept/route";
import { POST as inviteTherapistRoute } from "@/app/api/team/invitations/route";
import { PATCH as memberRoute } from "@/app/api/team/members/[memberId]/route";
import { db } from "@/db/client";
import { client } from "@/db/schema";
import { jsonRequest, params, sessionCookie } from "../support/auth-requests";
import { createClinic, createPerson, uniqueSuffix } from "../support/factories";

type ErrorJson = { error: { code: string; message: string; fields?: Record<string, string> } };

async function errorOf(response: Response) {
  const body = (await response.json()) as ErrorJson;
  expect(typeof body.error.message).toBe("string");
  return body.error;
}

describe("bad input to the JSON routes gets a clear 4xx and saves nothing", async () => {
  const clinic = await createClinic();
  const therapist = await createPerson(clinic, "therapist");
  const cookie = await sessionCookie(therapist.email);
  const none = params({});

  it("answers 400 with one message per missing or malformed field", async () => {
    const response = await inviteClientRoute(jsonRequest("/api/clients", { fullName: "", email: "not-an-address" }, { cookie }), none);
    expect(response.status).toBe(400);
    const error = await errorOf(response);
    expect(error.code).toBe("VALIDATION");
    expect(Object.keys(error.fields ?? {}).sort()).toEqual(["email", "fullName"]);
  });

  it("answers 400 for wrong types", async () => {
    const response = await inviteClientRoute(jsonRequest("/api/clients", { fullName: 42, email: ["a@b.example"] }, { cookie }), none);
    expect(response.status).toBe(400);
    expect((await errorOf(response)).fields).toHaveProperty("fullName");
  });

  it("answers 400 for a body that is not JSON at all", async () => {
    const response = await inviteClientRoute(jsonRequest("/api/clients", "{not json", { cookie }), none);
    expect(response.status).toBe(400);
    expect((await errorOf(response)).message).toMatch(/not valid JSON/);
  });

  it("answers 415 for a form-encoded body", async () => {
    const response = await inviteClientRoute(
      jsonRequest("/api/clients", "fullName=A&email=b", { cookie, contentType: "application/x-www-form-urlencoded" }),
      none,
    );
    expect(response.status).toBe(415);
  });

  it("answers 413 for an oversized body, however it declares its length", async () => {
    const email = `big-${uniqueSuffix()}@test.example`;
    const response = await inviteClientRoute(jsonRequest("/api/clients", { fullName: "x".repeat(70_000), email }, { cookie }), none);
    expect(response.status).toBe(413);
    expect(await db().select().from(client).where(eq(client.email, email))).toHaveLength(0);

    // A streamed body declares no length; the limit is enforced while reading.
    const bytes = new TextEncoder().encode(JSON.stringify({ fullName: "y".repeat(70_000), email }));
    const stream = new ReadableStream({
      start(controller) {
        controller.enqueue(bytes);
        controller.close();
      },
    });
    const streamed = new Request("http://127.0.0.1:3000/api/clients", {
      method: "POST",
      headers: { "content-type": "application/json", cookie },
      body: stream,
      duplex: "half",
    } as RequestInit);
    expect(streamed.headers.get("content-length")).toBeNull();
    expect((await inviteClientRoute(streamed, none)).status).toBe(413);
    expect(await db().select().from(client).where(eq(client.email, email))).toHaveLength(0);
  });

  it("answers 401 with no data when nobody is signed in, before looking at the body", async () => {
    for (const [call, path] of [
      [() => inviteClientRoute(jsonRequest("/api/clients", {}), none), "/api/clients"],
      [() => inviteTherapistRoute(jsonRequest("/api/team/invitations", {}), none), "/api/team/invitations"],
      [() => inviteCarerRoute(jsonRequest("/api/clients/x/carers", {}), params({ clientId: "x" })), "carers"],
      [() => memberRoute(jsonRequest("/api/team/members/x", {}, { method: "PATCH" }), params({ memberId: "x" })), "members"],
    ] as const) {
      const response = await call();
      expect(response.status, path).toBe(401);
      const error = await errorOf(response);
      expect(Object.keys(error).sort(), path).toEqual(["code", "message"]);
    }
  });

  it("answers 404 to an invitation that does not exist, and 400 to bad input for one that does", async () => {
    const response = await acceptRoute(
      jsonRequest("/api/invitations/nope/accept", { name: "Someone", password: "long-enough-pass", confirmPassword: "long-enough-pass" }),
      params({ invitationId: "nope" }),
    );
    expect(response.status).toBe(404);
    const bad = await acceptRoute(jsonRequest("/api/invitations/nope/accept", { name: "S" }), params({ invitationId: "nope" }));
    expect(bad.status).toBe(400);
    expect((await errorOf(bad)).fields).toHaveProperty("password");
  });
});
