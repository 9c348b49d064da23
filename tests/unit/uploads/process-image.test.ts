import exifr from "exifr";
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { DISPLAY_MAX_SIDE_PX, THUMBNAIL_MAX_SIDE_PX } from "@/lib/uploads/limits";
import { processImage } from "@/lib/uploads/process-image";
import { flatPng, noisyImage, phoneLikeJpeg, PLAIN_TEXT, solidImage, SVG_WITH_SCRIPT, transparentPng, truncated } from "./support/test-images";

async function refusal(promise: Promise<unknown>) {
  const error = await promise.then(
    () => null,
    (caught: unknown) => caught as { code?: string; message?: string },
  );
  expect(error, "expected a refusal").not.toBeNull();
  return { code: error?.code, message: error?.message };
}

describe("processImage", () => {
  it("turns the image upright and drops every piece of metadata", async () => {
    const input = await phoneLikeJpeg();
    expect((await exifr.gps(input))?.latitude).toBeCloseTo(51.5); // the fixture really does carry a position
    const { display, thumbnail } = await processImage(input);
    expect([display.width, display.height]).toEqual([100, 200]);
    for (const rendition of [display, thumbnail]) {
      expect(await exifr.parse(rendition.bytes, true)).toBeUndefined();
      const meta = await sharp(rendition.bytes).metadata();
      expect([meta.format, meta.exif, meta.icc, meta.xmp, meta.iptc, meta.orientation]).toEqual(["jpeg", undefined, undefined, undefined, undefined, undefined]);
    }
    // Orientation 6 turns the picture clockwise: the red left half becomes the top.
    const { data } = await sharp(display.bytes).raw().toBuffer({ resolveWithObject: true });
    expect(data[0]).toBeGreaterThan(200);
    expect(data[2]).toBeLessThan(50);
  });

  it("fits large images inside the display and thumbnail sizes and never enlarges small ones", async () => {
    const large = await processImage(await solidImage(4000, 3000, "png"));
    expect([large.display.width, large.display.height]).toEqual([DISPLAY_MAX_SIDE_PX, 1200]);
    expect([large.thumbnail.width, large.thumbnail.height]).toEqual([THUMBNAIL_MAX_SIDE_PX, 240]);
    const small = await processImage(await solidImage(120, 90, "webp"));
    expect([small.display.width, small.display.height, small.thumbnail.width]).toEqual([120, 90, 120]);
  });

  it("flattens transparency onto white, since JPEG has none", async () => {
    const { display } = await processImage(await transparentPng(20, 20));
    const { data, info } = await sharp(display.bytes).raw().toBuffer({ resolveWithObject: true });
    expect(info.channels).toBe(3);
    expect(Math.min(...data)).toBeGreaterThan(245);
  });

  it("refuses content that is not a JPEG, PNG or WebP", async () => {
    for (const bytes of [PLAIN_TEXT, SVG_WITH_SCRIPT, await sharp(await solidImage(8, 8)).gif().toBuffer()]) {
      expect(await refusal(processImage(bytes))).toEqual({ code: "UNSUPPORTED_MEDIA_TYPE", message: "That file is not a JPEG, PNG or WebP image." });
    }
  });

  it("refuses a truncated JPEG, PNG or WebP as damaged", async () => {
    for (const format of ["jpeg", "png", "webp"] as const) {
      const cut = truncated(await noisyImage(300, 200, format));
      expect(await refusal(processImage(cut)), format).toEqual({ code: "BAD_REQUEST", message: "The image file is damaged or incomplete." });
    }
  });

  it("refuses too many pixels from the header, before decoding, and honours a smaller cap", async () => {
    const image = await flatPng(1000, 1000);
    const tooMany = { code: "PAYLOAD_TOO_LARGE", message: "The image has too many pixels (the limit is 1 megapixel)." };
    expect(await refusal(processImage(image, { maxPixels: 999_999 }))).toEqual(tooMany);
    // With its pixel data cut away the file could not be decoded at all, yet it is refused for its size: the
    // header alone decided, so a huge image never reaches the decoder.
    expect(await refusal(processImage(truncated(image, 0.5), { maxPixels: 999_999 }))).toEqual(tooMany);
    // Exactly at the cap is allowed.
    await expect(processImage(image, { maxPixels: 1_000_000 })).resolves.toBeDefined();
  });
});
