import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { sniffImageType } from "@/lib/uploads/sniff-image-type";
import { PDF_HEADER, PLAIN_TEXT, SVG_WITH_SCRIPT, solidImage } from "./support/test-images";

const bytes = (...values: number[]) => Uint8Array.from(values);
const text = (value: string) => new TextEncoder().encode(value);

describe("sniffImageType decides by content alone", () => {
  it("recognises real JPEG, PNG and WebP files made by an encoder", async () => {
    expect(sniffImageType(await solidImage(8, 8, "jpeg"))).toBe("image/jpeg");
    expect(sniffImageType(await solidImage(8, 8, "png"))).toBe("image/png");
    expect(sniffImageType(await solidImage(8, 8, "webp"))).toBe("image/webp");
    // Lossless WebP uses a VP8L chunk rather than VP8; both are WebP.
    expect(sniffImageType(await sharp(await solidImage(8, 8, "png")).webp({ lossless: true }).toBuffer())).toBe("image/webp");
  });

  it("refuses formats Rampline does not accept, however they are named", async () => {
    expect(sniffImageType(SVG_WITH_SCRIPT)).toBeNull();
    expect(sniffImageType(PDF_HEADER)).toBeNull();
    expect(sniffImageType(PLAIN_TEXT)).toBeNull();
    expect(sniffImageType(text("GIF89a\x01\x00\x01\x00"))).toBeNull();
    // HEIC from a phone starts with an ISO-BMFF `ftyp` box; it is not one of the three.
    expect(sniffImageType(bytes(0, 0, 0, 0x18, ...text("ftypheic")))).toBeNull();
    expect(sniffImageType(await sharp(await solidImage(8, 8, "png")).tiff().toBuffer())).toBeNull();
  });

  it("does not take a near miss for an image", () => {
    expect(sniffImageType(new Uint8Array())).toBeNull();
    expect(sniffImageType(bytes(0xff, 0xd8))).toBeNull(); // too short to hold the third marker byte
    expect(sniffImageType(bytes(0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a))).toBeNull(); // PNG signature cut short
    expect(sniffImageType(text("RIFF\x24\x00\x00\x00WAVEfmt "))).toBeNull(); // a RIFF file, but audio
    expect(sniffImageType(text("RIFF\x24\x00\x00\x00WEBPJUNK"))).toBeNull(); // WEBP form type without a VP8 chunk
    expect(sniffImageType(text(" \xff\xd8\xff"))).toBeNull(); // the signature must be at the very start
  });
});
