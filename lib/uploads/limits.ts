// The limits every upload route starts from. A phone photo is 2–6 MB and 12–24 megapixels; these leave room for
// that and refuse what is far beyond it before it can cost much memory.
export const MAX_UPLOAD_BYTES = 10 * 1024 * 1024;
export const MAX_INPUT_PIXELS = 40_000_000;
// Renditions are made to fit inside a square of this side; smaller photos are never enlarged.
export const DISPLAY_MAX_SIDE_PX = 1600;
export const THUMBNAIL_MAX_SIDE_PX = 320;
// Boundaries, part headers and the small text fields around the file.
export const MULTIPART_OVERHEAD_BYTES = 64 * 1024;
// The form carries one file and at most a few short text fields (e.g. `kind`).
export const MAX_TEXT_FIELDS = 4;
export const MAX_TEXT_FIELD_BYTES = 1024;
