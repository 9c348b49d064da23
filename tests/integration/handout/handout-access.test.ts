import { afterAll, describe, expect, it, vi } from "vitest";
import { GET as handoutRoute } from "@/app/api/clients/[clientId]/programme/handout/route";
import { params, sessionCookie } from "../../support/auth-requests";
import { createClinic, createPerson } from "../../support/factories";
import { sampleContent } from "../../unit/programmes/fixtures";
import { solidImage } from "../../unit/uploads/support/test-images";
import { removeStorageRoot, type ErrorJson } from "../uploads/support/upload-requests";
import { publishVersion, storePlacementPhoto } from "./support/publish-handout";
import { readPdf } from "./support/read-pdf";

vi.hoisted(() => {
  process.env.STORAGE_DIR = `${process.env.STORAGE_DIR ?? ".data/uploads-test"}/handout-access-${process.pid}-${Date.now()}`;
});
afterAll(removeStorageRoot);

const get = (clientId: string, cookie?: string) =>
  handoutRoute(
    new Request(`http://127.0.0.1:3000/api/clients/${clientId}/programme/handout`, { headers: cookie ? { cookie } : {} }),
    params({ clientId }),
  );

async function errorOf(response: Response) {
  expect(response.headers.get("content-type")).toMatch(/^application\/json/);
  return ((await response.json()) as ErrorJson).error;
}

// source: DEVELOPERS.md "Who may do what": a record outside someone's reach is reported as not found, never as
// forbidden, and nobody signed out gets anything but a 401.
describe("who gets the handout PDF, and what the others get", async () => {
  const clinic = await createClinic();
  const therapist = await createPerson(clinic, "therapist");
  const client = await createPerson(clinic, "client", { therapistId: therapist.userId });
  const clientId = client.clientId!;
  const unpublished = await createPerson(clinic, "client", { therapistId: therapist.userId });
  const neighbour = await createPerson(clinic, "client", { therapistId: therapist.userId }); // same clinic, another client
  const borrower = await createPerson(clinic, "client", { therapistId: therapist.userId });
  const elsewhere = await createPerson(await createClinic("Other clinic"), "therapist");
  await publishVersion(client, therapist, sampleContent());

  it("answers 404 with the JSON error shape when nothing has been published", async () => {
    const response = await get(unpublished.clientId!, await sessionCookie(therapist.email));
    expect(response.status).toBe(404);
    const error = await errorOf(response);
    expect(error.code).toBe("NOT_FOUND");
    expect(error.message).toMatch(/no programme has been published/i);
  });

  it("answers someone outside the client's circle or clinic exactly as it answers for a client that does not exist", async () => {
    const missing = await errorOf(await get("client-that-does-not-exist", await sessionCookie(therapist.email)));
    for (const outsider of [elsewhere, neighbour]) {
      const response = await get(clientId, await sessionCookie(outsider.email));
      expect(response.status, outsider.role).toBe(404);
      expect(await errorOf(response)).toEqual(missing);
    }
  });

  it("answers 401 to someone not signed in, with no data", async () => {
    const response = await get(clientId);
    expect(response.status).toBe(401);
    const error = await errorOf(response);
    expect(Object.keys(error).sort()).toEqual(["code", "message"]);
    expect(error.code).toBe("UNAUTHENTICATED");
  });

  it("prints the version in force, the latest one", async () => {
    const updated = sampleContent();
    updated.ownCautions = ["A caution added in the second version."];
    await publishVersion(client, therapist, updated, 2);
    const response = await get(clientId, await sessionCookie(therapist.email));
    expect(response.headers.get("content-disposition")).toBe('attachment; filename="rampline-handout-v2.pdf"');
    const { text } = await readPdf(new Uint8Array(await response.arrayBuffer()));
    expect(text).toContain("Version 2, from");
    expect(text).not.toContain("Version 1, from");
    expect(text).toContain("A caution added in the second version.");
  });

  it("prints only the client's own photos, whatever ids the content names, and says one is missing", async () => {
    const theirs = await storePlacementPhoto(neighbour, therapist, await solidImage(64, 48));
    const content = sampleContent();
    content.channels[0]!.photoIds = [theirs.id];
    await publishVersion(borrower, therapist, content);
    const logged = vi.spyOn(console, "error").mockImplementation(() => undefined);
    try {
      const response = await get(borrower.clientId!, await sessionCookie(therapist.email));
      expect(response.status).toBe(200);
      const pdf = await readPdf(new Uint8Array(await response.arrayBuffer()));
      expect(pdf.images).toEqual([]);
      expect(pdf.text).toContain("One placement photo could not be printed here.");
      // The server log says which photo was refused, for whoever looks into it.
      expect(logged.mock.calls.flat().join(" ")).toContain(theirs.id);
    } finally {
      logged.mockRestore();
    }
  });
});
