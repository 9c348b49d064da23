import { describe, expect, it } from "vitest";
import { GET as versionRoute } from "@/app/api/clients/[clientId]/screenings/[screeningId]/route";
import { GET as listRoute } from "@/app/api/clients/[clientId]/screenings/route";
import { signScreening } from "@/lib/screening/sign";
import { params, sessionCookie } from "../../support/auth-requests";
import { createClinic, createPerson } from "../../support/factories";
import { clinicWithClient, withPacemaker } from "./helpers";

const get = (path: string, cookie: string) => new Request(`http://127.0.0.1:3000${path}`, { headers: { cookie } });

// Decision: screenings are the clinic's working record. Clinic admins and therapists read them; the client and
// their carers get 403 (they see the cautions in their programme); another clinic gets 404.
describe("reading screenings", () => {
  it("shows clinic staff every version, newest first, without caching", async () => {
    const { clinic, therapist, clientId } = await clinicWithClient();
    await signScreening(therapist, clientId, withPacemaker());
    const { screeningId } = await signScreening(therapist, clientId, withPacemaker());
    const admin = await createPerson(clinic, "admin");
    for (const who of [therapist, admin]) {
      const cookie = await sessionCookie(who.email);
      const list = await listRoute(get(`/api/clients/${clientId}/screenings`, cookie), params({ clientId }));
      expect(list.status).toBe(200);
      expect(list.headers.get("cache-control")).toBe("no-store");
      const body = (await list.json()) as { screenings: { version: number; redFlags: { id: string }[] }[] };
      expect(body.screenings.map((s) => s.version)).toEqual([2, 1]);
      const one = await versionRoute(get(`/api/clients/${clientId}/screenings/${screeningId}`, cookie), params({ clientId, screeningId }));
      expect(one.status).toBe(200);
      expect(await one.json()).toMatchObject({ screening: { version: 2, answers: { redFlags: { activeImplant: "yes" } } } });
    }
  });

  it("refuses the client and their carer (403) and another clinic (404)", async () => {
    const { clinic, therapist, client, clientId } = await clinicWithClient();
    const { screeningId } = await signScreening(therapist, clientId, withPacemaker());
    const carer = await createPerson(clinic, "carer", { clientId });
    for (const who of [client, carer]) {
      const cookie = await sessionCookie(who.email);
      expect((await listRoute(get(`/api/clients/${clientId}/screenings`, cookie), params({ clientId }))).status, who.role).toBe(403);
      expect((await versionRoute(get(`/api/clients/${clientId}/screenings/${screeningId}`, cookie), params({ clientId, screeningId }))).status).toBe(403);
    }
    const outsider = await createPerson(await createClinic("Other clinic"), "admin");
    const cookie = await sessionCookie(outsider.email);
    expect((await listRoute(get(`/api/clients/${clientId}/screenings`, cookie), params({ clientId }))).status).toBe(404);
  });

  it("answers 404 for a screening id of another client", async () => {
    const { clinic, therapist, clientId } = await clinicWithClient();
    const other = await createPerson(clinic, "client", { therapistId: therapist.userId });
    const { screeningId } = await signScreening(therapist, other.clientId!, withPacemaker());
    const cookie = await sessionCookie(therapist.email);
    const response = await versionRoute(get(`/api/clients/${clientId}/screenings/${screeningId}`, cookie), params({ clientId, screeningId }));
    expect(response.status).toBe(404);
  });
});
