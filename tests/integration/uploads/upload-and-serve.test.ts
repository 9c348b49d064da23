import { and, eq } from "drizzle-orm";
import exifr from "exifr";
import sharp from "sharp";
import { afterAll, describe, expect, it, vi } from "vitest";
import { POST as uploadRoute } from "@/app/api/clients/[clientId]/photos/route";
import { GET as photoRoute } from "@/app/api/photos/[photoId]/route";
import { db } from "@/db/client";
import { auditEvent, photo } from "@/db/schema";
import { params, sessionCookie } from "../../support/auth-requests";
import { createClinic, createPerson } from "../../support/factories";
import { phoneLikeJpeg, solidImage } from "../../unit/uploads/support/test-images";
import { photoRequest, removeStorageRoot, uploadRequest, type UploadJson } from "./support/upload-requests";

vi.hoisted(() => {
  process.env.STORAGE_DIR = `${process.env.STORAGE_DIR ?? ".data/uploads-test"}/serve-${process.pid}-${Date.now()}`;
});
afterAll(removeStorageRoot);

const idOf = (url: string) => new URL(url, "http://x").pathname.split("/").pop()!;

describe("an uploaded photo comes back upright, bare of metadata and privately served", async () => {
  const clinic = await createClinic();
  const therapist = await createPerson(clinic, "therapist");
  const client = await createPerson(clinic, "client", { therapistId: therapist.userId });
  const clientId = client.clientId!;
  const cookie = await sessionCookie(therapist.email);

  async function upload(bytes: Uint8Array, kind = "placement", as = cookie) {
    const response = await uploadRoute(uploadRequest(clientId, { cookie: as, kind, file: { bytes } }), params({ clientId }));
    expect(response.status).toBe(201);
    return { response, body: (await response.json()) as UploadJson };
  }
  const fetchPhoto = (url: string, as = cookie) => photoRoute(photoRequest(url, as), params({ photoId: idOf(url) }));

  it("strips EXIF and GPS, applies the orientation and records the display rendition", async () => {
    const source = await phoneLikeJpeg();
    expect(await exifr.gps(source)).toMatchObject({ latitude: 51.5 }); // the fixture carries a position to strip
    const { response, body } = await upload(source);
    expect(Object.keys(body).sort()).toEqual(["height", "id", "thumbnailUrl", "url", "width"]);
    expect([body.width, body.height]).toEqual([100, 200]); // orientation 6: the 200×100 original stood upright
    expect(body.url).toBe(`/api/photos/${body.id}`);
    expect(body.thumbnailUrl).toBe(`/api/photos/${body.id}?size=thumb`);
    expect(response.headers.get("location")).toBe(body.url);

    const served = await fetchPhoto(body.url);
    expect(served.status).toBe(200);
    const bytes = Buffer.from(await served.arrayBuffer());
    expect(await exifr.parse(bytes)).toBeUndefined();
    expect(await exifr.parse(bytes, true)).toBeUndefined(); // every segment exifr knows: EXIF, GPS, XMP, IPTC, ICC…
    const meta = await sharp(bytes).metadata();
    expect([meta.format, meta.width, meta.height, meta.orientation, meta.exif]).toEqual(["jpeg", 100, 200, undefined, undefined]);
    // Turned clockwise: the red half of the original is now the top of the picture.
    const { data } = await sharp(bytes).raw().toBuffer({ resolveWithObject: true });
    expect([data[0]! > 200, data[2]! < 50]).toEqual([true, true]);

    const [row] = await db().select().from(photo).where(eq(photo.id, body.id));
    expect(row).toMatchObject({
      organizationId: clinic.organizationId,
      clientId,
      kind: "placement",
      uploadedById: therapist.userId,
      contentType: "image/jpeg",
      width: 100,
      height: 200,
      bytes: bytes.length,
    });
    const audit = await db().select().from(auditEvent).where(and(eq(auditEvent.entityId, body.id), eq(auditEvent.action, "photo.uploaded")));
    expect(audit).toHaveLength(1);
  });

  it("serves the bytes with private, no-store, nosniff, inline and a locked-down CSP", async () => {
    const { body } = await upload(await solidImage(40, 30, "png"));
    for (const url of [body.url, body.thumbnailUrl]) {
      const served = await fetchPhoto(url);
      expect(served.status, url).toBe(200);
      expect(served.headers.get("content-type")).toBe("image/jpeg");
      expect(served.headers.get("cache-control")).toBe("private, no-store");
      expect(served.headers.get("x-content-type-options")).toBe("nosniff");
      expect(served.headers.get("content-disposition")).toBe("inline");
      expect(served.headers.get("content-security-policy")).toMatch(/^default-src 'none'(;|$)/);
    }
  });

  it("keeps within the display and thumbnail sizes and never enlarges", async () => {
    const { body } = await upload(await solidImage(3000, 2000, "webp"), "skin");
    expect([body.width, body.height]).toEqual([1600, 1067]);
    const thumbnail = await sharp(Buffer.from(await (await fetchPhoto(body.thumbnailUrl)).arrayBuffer())).metadata();
    expect([thumbnail.width, thumbnail.height]).toEqual([320, 213]);

    const small = await upload(await solidImage(90, 60), "skin");
    expect([small.body.width, small.body.height]).toEqual([90, 60]);
    const smallThumb = await sharp(Buffer.from(await (await fetchPhoto(small.body.thumbnailUrl)).arrayBuffer())).metadata();
    expect([smallThumb.width, smallThumb.height]).toEqual([90, 60]);
  });

  it("answers 400 to a size it does not have", async () => {
    const { body } = await upload(await solidImage(10, 10));
    const response = await fetchPhoto(`${body.url}?size=original`);
    expect(response.status).toBe(400);
  });
});
