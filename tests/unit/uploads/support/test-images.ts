// Invented test images, all drawn here with sharp: flat colours and arithmetic noise, never a photo of anyone.
import sharp from "sharp";

const RED = { r: 255, g: 0, b: 0 };
const BLUE = { r: 0, g: 0, b: 255 };

export async function solidImage(width: number, height: number, format: "jpeg" | "png" | "webp" = "jpeg") {
  return sharp({ create: { width, height, channels: 3, background: { r: 120, g: 160, b: 90 } } })[format]().toBuffer();
}

// Left half red, right half blue, so the direction of a rotation can be read off the pixels afterwards.
function twoTone(width: number, height: number) {
  const half = Math.floor(width / 2);
  return sharp({ create: { width, height, channels: 3, background: RED } }).composite([
    { input: { create: { width: width - half, height, channels: 3, background: BLUE } }, left: half, top: 0 },
  ]);
}

// A 200×100 JPEG carrying the metadata a phone would add: camera, time, GPS position and orientation 6
// (stored sideways; to be shown turned 90° clockwise, so it displays as 100×200 with the red half on top).
// withExif writes the tags; withMetadata({ orientation }) sets the orientation, which withExif alone does not.
export async function phoneLikeJpeg() {
  return twoTone(200, 100)
    .jpeg()
    .withExif({
      IFD0: { Make: "Invented Camera Co", Model: "Test 1" },
      IFD2: { DateTimeOriginal: "2024:03:04 05:06:07" },
      IFD3: { GPSLatitudeRef: "N", GPSLatitude: "51/1 30/1 0/1", GPSLongitudeRef: "W", GPSLongitude: "0/1 7/1 0/1" },
    })
    .withMetadata({ orientation: 6 })
    .toBuffer();
}

// Noise compresses badly, so the file has a long scan to cut into (a flat image would be almost all header).
export async function noisyImage(width: number, height: number, format: "jpeg" | "png" | "webp" = "jpeg") {
  const pixels = Buffer.alloc(width * height * 3);
  for (let index = 0; index < pixels.length; index += 1) pixels[index] = (index * 7919) % 251;
  return sharp(pixels, { raw: { width, height, channels: 3 } })[format]().toBuffer();
}

export async function transparentPng(width: number, height: number) {
  return sharp({ create: { width, height, channels: 4, background: { r: 0, g: 0, b: 0, alpha: 0 } } }).png().toBuffer();
}

// Many pixels but a tiny file: a flat colour compresses to almost nothing.
export async function flatPng(width: number, height: number) {
  return sharp({ create: { width, height, channels: 3, background: { r: 200, g: 200, b: 200 } } }).png().toBuffer();
}

export function truncated(bytes: Buffer, keep = 0.6) {
  return bytes.subarray(0, Math.floor(bytes.length * keep));
}

export const SVG_WITH_SCRIPT = Buffer.from(
  '<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(1)</script><rect width="10" height="10"/></svg>',
);
export const PDF_HEADER = Buffer.from("%PDF-1.7\n1 0 obj\n<< /Type /Catalog >>\nendobj\n");
export const PLAIN_TEXT = Buffer.from("This is a text file with an image's name.\n");
