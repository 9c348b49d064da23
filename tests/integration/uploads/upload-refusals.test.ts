import { afterAll, describe, expect, it, vi } from "vitest";
import { POST as uploadRoute } from "@/app/api/clients/[clientId]/photos/route";
import { MAX_UPLOAD_BYTES } from "@/lib/uploads/limits";
import { params, sessionCookie } from "../../support/auth-requests";
import { createClinic, createPerson } from "../../support/factories";
import { flatPng, noisyImage, PDF_HEADER, PLAIN_TEXT, solidImage, SVG_WITH_SCRIPT, truncated } from "../../unit/uploads/support/test-images";
import { removeStorageRoot, storedState, uploadRequest, type ErrorJson } from "./support/upload-requests";

// Each upload test file stores into its own folder, so counting files is not disturbed by the others.
vi.hoisted(() => {
  process.env.STORAGE_DIR = `${process.env.STORAGE_DIR ?? ".data/uploads-test"}/refusals-${process.pid}-${Date.now()}`;
});
afterAll(removeStorageRoot);

describe("a refused upload gets a clear message and stores nothing", async () => {
  const clinic = await createClinic();
  const therapist = await createPerson(clinic, "therapist");
  const client = await createPerson(clinic, "client", { therapistId: therapist.userId });
  const clientId = client.clientId!;
  const cookie = await sessionCookie(therapist.email);
  const context = params({ clientId });

  async function expectRefused(request: Request, status: number, message: string) {
    const before = await storedState(clientId);
    const response = await uploadRoute(request, context);
    expect(response.status).toBe(status);
    const body = (await response.json()) as ErrorJson;
    expect(body.error.message).toBe(message);
    expect(await storedState(clientId)).toEqual(before);
    return body.error;
  }

  const upload = (file: { bytes: Uint8Array; filename?: string; type?: string } | null, kind = "placement") =>
    uploadRequest(clientId, { cookie, kind, file });
  const notAnImage = "That file is not a JPEG, PNG or WebP image.";

  it("stores two renditions and one row for a good photo (the counts below can move)", async () => {
    const before = await storedState(clientId);
    const response = await uploadRoute(upload({ bytes: await solidImage(64, 48) }), context);
    expect(response.status).toBe(201);
    expect(await storedState(clientId)).toEqual({ rows: before.rows + 1, files: before.files + 2 });
  });

  it("refuses text named photo.jpg and declared as image/jpeg", async () => {
    await expectRefused(upload({ bytes: PLAIN_TEXT, filename: "photo.jpg", type: "image/jpeg" }), 415, notAnImage);
  });

  it("refuses an SVG (it can carry script), and a PDF named as a PNG", async () => {
    await expectRefused(upload({ bytes: SVG_WITH_SCRIPT, filename: "photo.svg", type: "image/svg+xml" }), 415, notAnImage);
    await expectRefused(upload({ bytes: PDF_HEADER, filename: "scan.png", type: "image/png" }), 415, notAnImage);
  });

  it("refuses a file one byte over the size cap", async () => {
    // A real JPEG start, so only the size can be what refuses it.
    const head = await solidImage(16, 16);
    const bytes = new Uint8Array(MAX_UPLOAD_BYTES + 1);
    bytes.set(head);
    await expectRefused(upload({ bytes }), 413, "The photo is larger than 10 MB.");
  });

  it("cuts off a streamed upload with no declared length at the cap, instead of reading it all", async () => {
    const chunk = new Uint8Array(256 * 1024);
    const head = new TextEncoder().encode(
      '--B\r\nContent-Disposition: form-data; name="kind"\r\n\r\nplacement\r\n' +
        '--B\r\nContent-Disposition: form-data; name="photo"; filename="a.jpg"\r\nContent-Type: image/jpeg\r\n\r\n',
    );
    let pulled = 0;
    const body = new ReadableStream<Uint8Array>(
      {
        pull(controller) {
          const next = pulled === 0 ? head : chunk;
          pulled += next.byteLength;
          // Would go on to 100 MB if the route read the whole body before checking its size.
          if (pulled > 100 * 1024 * 1024) return controller.close();
          controller.enqueue(next);
        },
      },
      { highWaterMark: 0 },
    );
    const request = new Request(`http://127.0.0.1:3000/api/clients/${clientId}/photos`, {
      method: "POST",
      headers: { cookie, "content-type": "multipart/form-data; boundary=B" },
      body,
      duplex: "half",
    } as RequestInit);
    await expectRefused(request, 413, "The photo is larger than 10 MB.");
    expect(pulled).toBeLessThan(MAX_UPLOAD_BYTES + 2 * 1024 * 1024);
  });

  it("refuses an image over the pixel cap, however small its file", async () => {
    const bytes = await flatPng(8000, 5001); // 40.008 megapixels of one colour: about 130 KB
    expect(bytes.length).toBeLessThan(1024 * 1024);
    await expectRefused(upload({ bytes, filename: "big.png", type: "image/png" }), 413, "The image has too many pixels (the limit is 40 megapixels).");
  });

  it("refuses a JPEG with its tail cut off", async () => {
    await expectRefused(upload({ bytes: truncated(await noisyImage(400, 300)) }), 400, "The image file is damaged or incomplete.");
  });

  it("refuses an empty file part and a form with no file part", async () => {
    const empty = await expectRefused(upload({ bytes: new Uint8Array(0) }), 400, "Choose a photo to upload.");
    expect(empty.fields).toEqual({ photo: "Choose a photo to upload." });
    const none = await expectRefused(upload(null), 400, "Choose a photo to upload.");
    expect(none.fields).toEqual({ photo: "Choose a photo to upload." });
  });

  it("refuses a body that is not multipart/form-data", async () => {
    const request = new Request(`http://127.0.0.1:3000/api/clients/${clientId}/photos`, {
      method: "POST",
      headers: { cookie, "content-type": "application/json" },
      body: JSON.stringify({ kind: "placement", photo: "aGVsbG8=" }),
    });
    await expectRefused(request, 415, "Send the photo as a file upload (Content-Type: multipart/form-data).");
  });

  it("refuses an unknown kind, naming the field", async () => {
    const error = await expectRefused(upload({ bytes: await solidImage(8, 8) }, "selfie"), 400, "Some fields need attention.");
    expect(Object.keys(error.fields ?? {})).toEqual(["kind"]);
  });
});
