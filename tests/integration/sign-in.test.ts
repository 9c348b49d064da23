import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { session } from "@/db/schema";
import { getActorFromHeaders } from "@/lib/auth/actor";
import { env } from "@/lib/env";
import { setTherapistActive } from "@/lib/team/set-therapist-active";
import { sessionCookie, signIn } from "../support/auth-requests";
import { createClinic, createPerson } from "../support/factories";

describe("sign-in on Rampline's own copy of better-auth's tables", () => {
  it("signs a person in and resolves them to their clinic and role", async () => {
    const clinic = await createClinic();
    const therapist = await createPerson(clinic, "therapist");
    const cookie = await sessionCookie(therapist.email);
    const actor = await getActorFromHeaders(new Headers({ cookie }));
    expect(actor).toMatchObject({ userId: therapist.userId, role: "therapist", organizationId: clinic.organizationId });
  });

  it("refuses a wrong password with 401 and sets no cookie", async () => {
    const clinic = await createClinic();
    const client = await createPerson(clinic, "client");
    const response = await signIn(client.email, "not-the-password");
    expect(response.status).toBe(401);
    expect(response.headers.getSetCookie()).toHaveLength(0);
  });

  it("resolves a carer to the one client they are linked to", async () => {
    const clinic = await createClinic();
    const client = await createPerson(clinic, "client");
    const carer = await createPerson(clinic, "carer", { clientId: client.clientId! });
    const actor = await getActorFromHeaders(new Headers({ cookie: await sessionCookie(carer.email) }));
    expect(actor).toMatchObject({ role: "carer", clientId: client.clientId });
  });
});

describe("sign-in rate limiting", () => {
  it("answers 429 once the attempts from one address pass the limit, and other addresses are unaffected", async () => {
    const clinic = await createClinic();
    const client = await createPerson(clinic, "client");
    const limit = env().SIGN_IN_RATE_LIMIT_MAX;
    const octet = Math.floor(Math.random() * 200);
    const statuses: number[] = [];
    for (let attempt = 0; attempt <= limit; attempt++) {
      statuses.push((await signIn(client.email, "wrong-password", `203.0.113.${octet}`)).status);
    }
    expect(statuses.slice(0, limit)).toEqual(Array(limit).fill(401));
    expect(statuses[limit]).toBe(429);
    expect((await signIn(client.email, undefined, `203.0.113.${octet + 1}`)).status).toBe(200);
  });
});

describe("deactivating a therapist", () => {
  it("ends their sessions at once and stops them signing in; reactivating lets them back", async () => {
    const clinic = await createClinic();
    const admin = await createPerson(clinic, "admin");
    const therapist = await createPerson(clinic, "therapist");
    const cookie = await sessionCookie(therapist.email);
    const [membership] = await db().query.member.findMany({ where: (m, { eq: is }) => is(m.userId, therapist.userId) });

    await setTherapistActive(admin, membership!.id, { active: false });

    expect(await getActorFromHeaders(new Headers({ cookie }))).toBeNull();
    expect(await db().select().from(session).where(eq(session.userId, therapist.userId))).toHaveLength(0);
    expect((await signIn(therapist.email)).ok).toBe(false);

    await setTherapistActive(admin, membership!.id, { active: true });
    expect((await signIn(therapist.email)).status).toBe(200);
  });
});
