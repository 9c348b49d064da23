// Decides what a file is from its first bytes, never from its name or the type the sender declared. Only the three
// formats Rampline accepts are recognised; everything else (SVG, PDF, HEIC, text…) is null. A short hand-written
// check is clearer here than a general detector that knows hundreds of formats we would refuse anyway, and the
// decoder then proves the rest of the file.
export const ACCEPTED_IMAGE_TYPES = ["image/jpeg", "image/png", "image/webp"] as const;
export type AcceptedImageType = (typeof ACCEPTED_IMAGE_TYPES)[number];

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

function startsWith(bytes: Uint8Array, signature: readonly number[], offset = 0): boolean {
  if (bytes.length < offset + signature.length) return false;
  return signature.every((byte, index) => bytes[offset + index] === byte);
}

const ascii = (text: string) => [...text].map((character) => character.charCodeAt(0));

export function sniffImageType(bytes: Uint8Array): AcceptedImageType | null {
  // JPEG: start-of-image marker followed by the start of another marker segment.
  if (startsWith(bytes, [0xff, 0xd8, 0xff])) return "image/jpeg";
  // PNG: the fixed eight-byte signature (it includes line endings so a text-mode transfer would break it).
  if (startsWith(bytes, PNG_SIGNATURE)) return "image/png";
  // WebP: a RIFF container whose form type is WEBP, with a VP8 / VP8L / VP8X chunk first.
  if (startsWith(bytes, ascii("RIFF")) && startsWith(bytes, ascii("WEBP"), 8) && startsWith(bytes, ascii("VP8"), 12)) {
    return "image/webp";
  }
  return null;
}
