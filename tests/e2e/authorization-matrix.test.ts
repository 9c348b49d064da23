import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { checkIn, flag, member, photo, screening } from "@/db/schema";
import { createClinic, createPerson, TEST_PASSWORD } from "../support/factories";
import { demo } from "./support/demo-accounts";
import { httpRequest, httpSignIn } from "./support/http";

// Every route so far, for every kind of person. "ok" means allowed: pages answer 200 (or redirect to the person's
// home), JSON writes answer 400 because the matrix sends an empty body, which proves the request got past every
// access check without creating anything. "in" means a redirect to sign-in.
type Who = "anonymous" | "client" | "carer" | "therapist" | "otherTherapist" | "admin" | "otherAdmin";
type Outcome = "ok" | "in" | 401 | 403 | 404;
const WHO: Who[] = ["anonymous", "client", "carer", "therapist", "otherTherapist", "admin", "otherAdmin"];

const cookies = {} as Record<Who, string | undefined>;
const ids = { arthur: "demo-client-arthur", brenda: "demo-client-brenda", foreign: "", priyaMember: "", arthurPhoto: "", arthurScreening: "", arthurCheckIn: "", callumFlag: "" };
let foreignClientName = "";

beforeAll(async () => {
  // A second clinic, so that "someone else's clinic" is tested with real rows.
  const otherClinic = await createClinic("Elsewhere clinic");
  const otherTherapist = await createPerson(otherClinic, "therapist");
  const otherAdmin = await createPerson(otherClinic, "admin");
  const foreign = await createPerson(otherClinic, "client", { therapistId: otherTherapist.userId });
  ids.foreign = foreign.clientId!;
  foreignClientName = foreign.name;
  const [priya] = await db().select().from(member).where(eq(member.userId, "demo-priya"));
  ids.priyaMember = priya!.id;
  const [arthurPhoto] = await db().select().from(photo).where(eq(photo.clientId, ids.arthur));
  ids.arthurPhoto = arthurPhoto!.id;
  const [arthurScreening] = await db().select().from(screening).where(eq(screening.clientId, ids.arthur));
  ids.arthurScreening = arthurScreening!.id;
  const [arthurCheckIn] = await db().select().from(checkIn).where(eq(checkIn.clientId, ids.arthur));
  ids.arthurCheckIn = arthurCheckIn!.id;
  // The seed raises one on Callum's skin report; any flag of the demo clinic will do.
  const [callumFlag] = await db().select().from(flag).where(eq(flag.organizationId, "demo-clinic-larkmoor"));
  ids.callumFlag = callumFlag!.id;
  cookies.client = await httpSignIn(demo.client.email, demo.password);
  cookies.carer = await httpSignIn(demo.carer.email, demo.password);
  cookies.therapist = await httpSignIn(demo.therapist.email, demo.password);
  cookies.admin = await httpSignIn(demo.admin.email, demo.password);
  cookies.otherTherapist = await httpSignIn(otherTherapist.email, TEST_PASSWORD);
  cookies.otherAdmin = await httpSignIn(otherAdmin.email, TEST_PASSWORD);
});

// `okStatus` is what an allowed request answers: 400 for writes sent an invalid body, 200 for reads, 415 for the
// photo upload sent JSON instead of a file.
type Row = { method: string; label?: string; path: () => string; body?: unknown; okStatus?: number; expect: Record<Who, Outcome>; secret?: () => string };

const staffOnly = { anonymous: "in", client: 403, carer: 403 } as const;
const arthurStaff = { therapist: "ok", otherTherapist: 404, admin: "ok", otherAdmin: 404 } as const;
const arthurCircle = { anonymous: 401, client: "ok", carer: "ok", ...arthurStaff } as const;
const arthurTherapistWrites = { anonymous: 401, client: 403, carer: 403, therapist: "ok", otherTherapist: 404, admin: 403, otherAdmin: 403 } as const;
const rows: Row[] = [
  { method: "GET", path: () => "/", expect: { anonymous: "ok", client: "ok", carer: "ok", therapist: "ok", otherTherapist: "ok", admin: "ok", otherAdmin: "ok" } },
  { method: "GET", path: () => "/home", expect: { anonymous: "in", client: "ok", carer: "ok", therapist: "ok", otherTherapist: "ok", admin: "ok", otherAdmin: "ok" } },
  { method: "GET", path: () => "/caseload", expect: { ...staffOnly, therapist: "ok", otherTherapist: "ok", admin: 403, otherAdmin: 403 } },
  { method: "GET", path: () => "/team", expect: { ...staffOnly, therapist: 403, otherTherapist: 403, admin: "ok", otherAdmin: "ok" } },
  {
    method: "GET",
    label: "/clients/<own clinic's client>",
    path: () => `/clients/${ids.arthur}`,
    secret: () => demo.client.name,
    expect: { ...staffOnly, therapist: "ok", otherTherapist: 404, admin: "ok", otherAdmin: 404 },
  },
  {
    method: "GET",
    label: "/clients/<other clinic's client>",
    path: () => `/clients/${ids.foreign}`,
    secret: () => foreignClientName,
    expect: { ...staffOnly, therapist: 404, otherTherapist: "ok", admin: 404, otherAdmin: "ok" },
  },
  { method: "GET", path: () => "/today", expect: { anonymous: "in", client: "ok", carer: "ok", therapist: 403, otherTherapist: 403, admin: 403, otherAdmin: 403 } },
  {
    method: "POST",
    path: () => "/api/team/invitations",
    body: {},
    expect: { anonymous: 401, client: 403, carer: 403, therapist: 403, otherTherapist: 403, admin: "ok", otherAdmin: "ok" },
  },
  {
    method: "PATCH",
    label: "/api/team/members/<own clinic's therapist>",
    path: () => `/api/team/members/${ids.priyaMember}`,
    body: {},
    expect: { anonymous: 401, client: 403, carer: 403, therapist: 403, otherTherapist: 403, admin: "ok", otherAdmin: 404 },
  },
  {
    method: "POST",
    path: () => "/api/clients",
    body: {},
    expect: { anonymous: 401, client: 403, carer: 403, therapist: "ok", otherTherapist: "ok", admin: 403, otherAdmin: 403 },
  },
  {
    method: "POST",
    label: "/api/clients/<the client's own record>/carers",
    path: () => `/api/clients/${ids.arthur}/carers`,
    body: {},
    expect: { anonymous: 401, client: "ok", carer: 403, therapist: "ok", otherTherapist: 404, admin: 403, otherAdmin: 403 },
  },
  {
    method: "POST",
    label: "/api/clients/<another client of the clinic>/carers",
    path: () => `/api/clients/${ids.brenda}/carers`,
    body: {},
    expect: { anonymous: 401, client: 404, carer: 403, therapist: "ok", otherTherapist: 404, admin: 403, otherAdmin: 403 },
  },
  ...["programme", "programme/versions", "handout", "screening", "messages", "timeline", "trends"].map(
    (page): Row => ({ method: "GET", label: `/clients/<own clinic's client>/${page}`, path: () => `/clients/${ids.arthur}/${page}`, secret: () => demo.client.name, expect: { ...staffOnly, ...arthurStaff } }),
  ),
  { method: "GET", label: "/clients/<own clinic's client>/screening/new", path: () => `/clients/${ids.arthur}/screening/new`, secret: () => demo.client.name, expect: { ...staffOnly, therapist: "ok", otherTherapist: 404, admin: 403, otherAdmin: 404 } },
  ...["/programme", "/programme/handout", "/check-in", "/history", "/messages", "/session"].map(
    (path): Row => ({ method: "GET", path: () => path, expect: { anonymous: "in", client: "ok", carer: "ok", therapist: 403, otherTherapist: 403, admin: 403, otherAdmin: 403 } }),
  ),
  { method: "GET", path: () => "/audit", expect: { ...staffOnly, therapist: 403, otherTherapist: 403, admin: "ok", otherAdmin: "ok" } },
  { method: "PATCH", label: "/api/clients/<own clinic's client>", path: () => `/api/clients/${ids.arthur}`, body: { affectedSide: "upwards" }, expect: arthurTherapistWrites },
  { method: "POST", label: "/api/clients/<own clinic's client>/consents", path: () => `/api/clients/${ids.arthur}/consents`, body: {}, expect: { ...arthurTherapistWrites, client: "ok" } },
  { method: "GET", label: "/api/clients/<own clinic's client>/screenings", path: () => `/api/clients/${ids.arthur}/screenings`, okStatus: 200, expect: { anonymous: 401, client: 403, carer: 403, ...arthurStaff } },
  { method: "POST", label: "/api/clients/<own clinic's client>/screenings", path: () => `/api/clients/${ids.arthur}/screenings`, body: {}, expect: arthurTherapistWrites },
  {
    method: "POST",
    label: "/api/clients/<own clinic's client>/screenings/<id>/clearances",
    path: () => `/api/clients/${ids.arthur}/screenings/${ids.arthurScreening}/clearances`,
    body: {},
    expect: arthurTherapistWrites,
  },
  { method: "PUT", label: "/api/clients/<own clinic's client>/programme/draft", path: () => `/api/clients/${ids.arthur}/programme/draft`, body: {}, expect: arthurTherapistWrites },
  { method: "POST", label: "/api/clients/<own clinic's client>/programme/versions", path: () => `/api/clients/${ids.arthur}/programme/versions`, body: {}, expect: arthurTherapistWrites },
  { method: "POST", label: "/api/clients/<own clinic's client>/photos", path: () => `/api/clients/${ids.arthur}/photos`, body: {}, okStatus: 415, expect: arthurCircle },
  // A photo is either served or "not found", whoever asks: even the signed-out get a 404 rather than a 401.
  { method: "GET", label: "/api/photos/<own clinic's client's photo>", path: () => `/api/photos/${ids.arthurPhoto}`, okStatus: 200, expect: { ...arthurCircle, anonymous: 404 } },
  { method: "GET", label: "/api/clients/<own clinic's client>/programme/handout", path: () => `/api/clients/${ids.arthur}/programme/handout`, okStatus: 200, expect: arthurCircle },
  { method: "GET", label: "/api/clients/<another client of the clinic>/programme/handout", path: () => `/api/clients/${ids.brenda}/programme/handout`, okStatus: 404, expect: { ...arthurCircle, client: 404, carer: 404, therapist: "ok", admin: "ok" } },
  { method: "POST", label: "/api/clients/<own clinic's client>/check-ins", path: () => `/api/clients/${ids.arthur}/check-ins`, body: {}, expect: { anonymous: 401, client: "ok", carer: "ok", therapist: 403, otherTherapist: 403, admin: 403, otherAdmin: 403 } },
  { method: "POST", label: "/api/clients/<another client of the clinic>/check-ins", path: () => `/api/clients/${ids.brenda}/check-ins`, body: {}, expect: { anonymous: 401, client: 404, carer: 404, therapist: 403, otherTherapist: 403, admin: 403, otherAdmin: 403 } },
  { method: "POST", label: "/api/clients/<own clinic's client>/electrode-packs", path: () => `/api/clients/${ids.arthur}/electrode-packs`, body: {}, expect: { anonymous: 401, client: "ok", carer: "ok", therapist: 403, otherTherapist: 403, admin: 403, otherAdmin: 403 } },
  { method: "GET", label: "/clients/<own clinic's client>/check-ins/<a check-in>", path: () => `/clients/${ids.arthur}/check-ins/${ids.arthurCheckIn}`, secret: () => demo.client.name, expect: { ...staffOnly, ...arthurStaff } },
  { method: "GET", path: () => "/review", expect: { ...staffOnly, therapist: "ok", otherTherapist: "ok", admin: "ok", otherAdmin: "ok" } },
  { method: "GET", path: () => "/settings", expect: { anonymous: "in", client: "ok", carer: "ok", therapist: "ok", otherTherapist: "ok", admin: "ok", otherAdmin: "ok" } },
  { method: "PUT", path: () => "/api/me/notifications", body: {}, expect: { anonymous: 401, client: "ok", carer: "ok", therapist: "ok", otherTherapist: "ok", admin: "ok", otherAdmin: "ok" } },
  { method: "GET", label: "/api/clients/<own clinic's client>/messages", path: () => `/api/clients/${ids.arthur}/messages`, okStatus: 200, expect: arthurCircle },
  { method: "POST", label: "/api/clients/<own clinic's client>/messages", path: () => `/api/clients/${ids.arthur}/messages`, body: {}, expect: { ...arthurCircle, admin: 403, otherAdmin: 403 } },
  { method: "POST", label: "/api/clients/<another client of the clinic>/messages", path: () => `/api/clients/${ids.brenda}/messages`, body: {}, expect: { anonymous: 401, client: 404, carer: 404, therapist: "ok", otherTherapist: 404, admin: 403, otherAdmin: 403 } },
  { method: "POST", label: "/api/clients/<own clinic's client>/messages/read", path: () => `/api/clients/${ids.arthur}/messages/read`, okStatus: 200, expect: arthurCircle },
  { method: "POST", label: "/api/clients/<own clinic's client>/programme/confirmations", path: () => `/api/clients/${ids.arthur}/programme/confirmations`, body: {}, expect: { anonymous: 401, client: "ok", carer: "ok", therapist: 403, otherTherapist: 403, admin: 403, otherAdmin: 403 } },
  { method: "PATCH", label: "/api/flags/<a flag of the demo clinic>", path: () => `/api/flags/${ids.callumFlag}`, body: {}, expect: { anonymous: 401, client: 403, carer: 403, therapist: "ok", otherTherapist: 404, admin: 403, otherAdmin: 403 } },
  { method: "POST", path: () => "/api/programme-templates", body: {}, expect: { anonymous: 401, client: 403, carer: 403, therapist: "ok", otherTherapist: "ok", admin: 403, otherAdmin: 403 } },
  // better-auth endpoints Rampline does not use are not reachable at all, whoever asks.
  ...["/api/auth/sign-up/email", "/api/auth/organization/invite-member", "/api/auth/organization/create", "/api/auth/admin/ban-user", "/api/auth/admin/set-role"].map(
    (path): Row => ({ method: "POST", path: () => path, body: {}, expect: Object.fromEntries(WHO.map((who) => [who, 404])) as Record<Who, Outcome> }),
  ),
];

describe("authorisation matrix", () => {
  for (const row of rows) {
    for (const who of WHO) {
      const expected = row.expect[who];
      it(`${row.method} ${row.label ?? row.path()} as ${who} → ${expected}`, async () => {
        const result = await httpRequest(row.method, row.path(), { cookie: cookies[who], body: row.body });
        if (expected === "in") {
          expect(result.status).toBe(307);
          expect(result.location).toMatch(/\/sign-in(\?|$)/);
        } else if (expected === "ok") {
          const isApi = row.path().startsWith("/api/");
          if (isApi) expect(result.status).toBe(row.okStatus ?? 400);
          else expect([200, 307]).toContain(result.status);
          if (!isApi && result.status === 307) expect(result.location).not.toMatch(/sign-in/);
        } else {
          expect(result.status).toBe(expected);
          if (row.path().startsWith("/api/")) {
            const body = JSON.parse(result.text) as { error: Record<string, unknown> };
            // A refusal is the error alone: no fields, no reasons, nothing about the record.
            expect(Object.keys(body)).toEqual(["error"]);
            expect(Object.keys(body.error).sort()).toEqual(["code", "message"]);
          }
        }
        // A refusal never carries the record it protects.
        if (expected !== "ok" && row.secret) expect(result.text).not.toContain(row.secret());
      });
    }
  }
});
