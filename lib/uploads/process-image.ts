import sharp from "sharp";
import { DISPLAY_MAX_SIDE_PX, MAX_INPUT_PIXELS, THUMBNAIL_MAX_SIDE_PX } from "./limits";
import { sniffImageType, type AcceptedImageType } from "./sniff-image-type";
import { damagedImage, notAnImage, tooManyPixels } from "./upload-errors";

export type Rendition = { bytes: Buffer; width: number; height: number; contentType: "image/jpeg" };
export type ProcessedImage = { sourceType: AcceptedImageType; display: Rendition; thumbnail: Rendition };
export type ProcessImageOptions = { maxPixels?: number; displayMaxSide?: number; thumbnailMaxSide?: number };

const SHARP_FORMAT: Record<AcceptedImageType, string> = { "image/jpeg": "jpeg", "image/png": "png", "image/webp": "webp" };

// Reads only the header (no pixel data), so a huge image is refused before it is decoded.
async function readHeader(bytes: Buffer) {
  try {
    return await sharp(bytes, { limitInputPixels: false }).metadata();
  } catch {
    throw damagedImage();
  }
}

// Decodes the untrusted file once, turned upright from its EXIF orientation, shrunk to the display size and
// flattened onto white (JPEG has no transparency). What comes out is bare pixels: no EXIF, GPS, XMP, IPTC or ICC
// can survive into the renditions, because they are encoded from these pixels alone.
async function decodeUpright(bytes: Buffer, maxPixels: number, maxSide: number) {
  try {
    return await sharp(bytes, { failOn: "truncated", limitInputPixels: maxPixels })
      .rotate()
      .resize({ width: maxSide, height: maxSide, fit: "inside", withoutEnlargement: true })
      .flatten({ background: "#ffffff" })
      .toColourspace("srgb")
      .raw({ depth: "uchar" })
      .toBuffer({ resolveWithObject: true });
  } catch {
    throw damagedImage();
  }
}

// Accepts a JPEG, PNG or WebP and returns two JPEG renditions. JPEG because every browser, e-mail client and the
// PDF handout renderer (@react-pdf/renderer reads JPEG and PNG only) can show it. The display rendition keeps full
// colour resolution (4:4:4) because a faint redness on skin is a colour detail that chroma subsampling blurs.
export async function processImage(bytes: Buffer, options: ProcessImageOptions = {}): Promise<ProcessedImage> {
  const maxPixels = options.maxPixels ?? MAX_INPUT_PIXELS;
  const sourceType = sniffImageType(bytes);
  if (!sourceType) throw notAnImage();
  const header = await readHeader(bytes);
  if (header.format !== SHARP_FORMAT[sourceType]) throw notAnImage();
  // A multi-page file (animated WebP or PNG) is decoded from its first page only, so that is what counts.
  const height = header.pageHeight ?? header.height;
  if (!header.width || !height) throw damagedImage();
  if (header.width * height > maxPixels) throw tooManyPixels(maxPixels);

  const pixels = await decodeUpright(bytes, maxPixels, options.displayMaxSide ?? DISPLAY_MAX_SIDE_PX);
  const { width, height: displayHeight, channels } = pixels.info;
  const fromPixels = () => sharp(pixels.data, { raw: { width, height: displayHeight, channels } });

  const display = await fromPixels().jpeg({ quality: 85, chromaSubsampling: "4:4:4" }).toBuffer({ resolveWithObject: true });
  const thumbnailSide = options.thumbnailMaxSide ?? THUMBNAIL_MAX_SIDE_PX;
  const thumbnail = await fromPixels()
    .resize({ width: thumbnailSide, height: thumbnailSide, fit: "inside", withoutEnlargement: true })
    .jpeg({ quality: 80 })
    .toBuffer({ resolveWithObject: true });

  const rendition = (output: typeof display): Rendition => ({
    bytes: output.data,
    width: output.info.width,
    height: output.info.height,
    contentType: "image/jpeg",
  });
  return { sourceType, display: rendition(display), thumbnail: rendition(thumbnail) };
}
