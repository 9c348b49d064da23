import { afterAll, describe, expect, it, vi } from "vitest";
import { POST as uploadRoute } from "@/app/api/clients/[clientId]/photos/route";
import { GET as photoRoute } from "@/app/api/photos/[photoId]/route";
import { params, sessionCookie } from "../../support/auth-requests";
import { createClinic, createPerson } from "../../support/factories";
import { solidImage, SVG_WITH_SCRIPT } from "../../unit/uploads/support/test-images";
import { photoRequest, removeStorageRoot, storedState, uploadRequest, type ErrorJson, type UploadJson } from "./support/upload-requests";

vi.hoisted(() => {
  process.env.STORAGE_DIR = `${process.env.STORAGE_DIR ?? ".data/uploads-test"}/access-${process.pid}-${Date.now()}`;
});
afterAll(removeStorageRoot);

// source: DEVELOPERS.md "Who may do what" — staff reach every client of their clinic, a client their own record,
// a carer the client they are linked to; anything else is reported as not found.
describe("who may upload and see a client's photos", async () => {
  const clinic = await createClinic();
  const therapist = await createPerson(clinic, "therapist");
  const colleague = await createPerson(clinic, "therapist"); // same clinic, not the primary therapist
  const admin = await createPerson(clinic, "admin");
  const client = await createPerson(clinic, "client", { therapistId: therapist.userId });
  const clientId = client.clientId!;
  const carer = await createPerson(clinic, "carer", { clientId });
  const otherClient = await createPerson(clinic, "client", { therapistId: therapist.userId });
  const otherCarer = await createPerson(clinic, "carer", { clientId: otherClient.clientId! });
  const elsewhere = await createPerson(await createClinic("Other clinic"), "therapist");

  const people = { therapist, colleague, admin, client, carer, otherClient, otherCarer, elsewhere };
  const cookies = Object.fromEntries(
    await Promise.all(Object.entries(people).map(async ([name, person]) => [name, await sessionCookie(person.email)] as const)),
  ) as Record<keyof typeof people, string>;

  const image = await solidImage(32, 24);
  const upload = (cookie: string | undefined, kind: string, bytes: Uint8Array = image) =>
    uploadRoute(uploadRequest(clientId, { cookie, kind, file: { bytes } }), params({ clientId }));
  const fetchPhoto = (photoId: string, cookie?: string) => photoRoute(photoRequest(`/api/photos/${photoId}`, cookie), params({ photoId }));

  const placed = await upload(cookies.therapist, "placement");
  const { id: photoId } = (await placed.json()) as UploadJson;

  it("lets the client, their carer and the clinic's staff fetch the photo", async () => {
    expect(placed.status).toBe(201);
    for (const name of ["client", "carer", "therapist", "colleague", "admin"] as const) {
      const response = await fetchPhoto(photoId, cookies[name]);
      expect(response.status, name).toBe(200);
      expect(response.headers.get("content-type"), name).toBe("image/jpeg");
    }
  });

  it("answers everyone else exactly as for a photo that does not exist", async () => {
    const missing = await fetchPhoto(crypto.randomUUID(), cookies.therapist);
    expect(missing.status).toBe(404);
    const missingBody = await missing.text();
    for (const name of ["otherClient", "otherCarer", "elsewhere", "anonymous"] as const) {
      const response = await fetchPhoto(photoId, name === "anonymous" ? undefined : cookies[name]);
      expect(response.status, name).toBe(404);
      expect(response.headers.get("content-type"), name).toMatch(/^application\/json/);
      expect(await response.text(), name).toBe(missingBody);
    }
  });

  it("lets only a therapist add placement photos, and anyone in reach add skin and message photos", async () => {
    for (const name of ["client", "carer", "admin"] as const) {
      const before = await storedState(clientId);
      const response = await upload(cookies[name], "placement");
      expect(response.status, name).toBe(403);
      expect(((await response.json()) as ErrorJson).error.message).toBe("Only a therapist can add electrode placement photos.");
      expect(await storedState(clientId), name).toEqual(before);
    }
    for (const [name, kind] of [["client", "skin"], ["carer", "message"], ["admin", "skin"], ["colleague", "message"]] as const) {
      expect((await upload(cookies[name], kind)).status, `${name} ${kind}`).toBe(201);
    }
  });

  it("answers 401 to an anonymous upload and 404 to someone who cannot reach the client, before reading the file", async () => {
    const before = await storedState(clientId);
    const anonymous = await upload(undefined, "skin", SVG_WITH_SCRIPT);
    expect(anonymous.status).toBe(401);
    // A file that would be refused with 415 shows the reach check comes first: the client's existence stays hidden.
    for (const name of ["elsewhere", "otherClient", "otherCarer"] as const) {
      const response = await upload(cookies[name], "skin", SVG_WITH_SCRIPT);
      expect(response.status, name).toBe(404);
      expect(((await response.json()) as ErrorJson).error.message).toBe("That client was not found.");
    }
    expect(await storedState(clientId)).toEqual(before);
  });
});
