import { AppError } from "@/lib/errors";

// Every refusal of an upload, worded once. Statuses come from lib/errors.ts through the code.
const MIB = 1024 * 1024;
const oneDecimal = (value: number) => Math.round(value * 10) / 10;
// "10 MB" for the real cap (binary megabytes, as phones and file managers count them); KB for the small caps tests use.
const sizeText = (bytes: number) => (bytes >= MIB ? `${oneDecimal(bytes / MIB)} MB` : `${oneDecimal(bytes / 1024)} KB`);
const megapixels = (pixels: number) => oneDecimal(pixels / 1_000_000);

export const notMultipart = () =>
  new AppError("UNSUPPORTED_MEDIA_TYPE", "Send the photo as a file upload (Content-Type: multipart/form-data).");

export const notAnImage = () => new AppError("UNSUPPORTED_MEDIA_TYPE", "That file is not a JPEG, PNG or WebP image.");

export const fileTooLarge = (maxBytes: number) =>
  new AppError("PAYLOAD_TOO_LARGE", `The photo is larger than ${sizeText(maxBytes)}.`);

export const tooManyPixels = (maxPixels: number) => {
  const limit = megapixels(maxPixels);
  return new AppError("PAYLOAD_TOO_LARGE", `The image has too many pixels (the limit is ${limit} megapixel${limit === 1 ? "" : "s"}).`);
};

export const damagedImage = () => new AppError("BAD_REQUEST", "The image file is damaged or incomplete.");

export const malformedUpload = () => new AppError("BAD_REQUEST", "The upload was incomplete or malformed. Please try again.");

export const oneFileOnly = () => new AppError("BAD_REQUEST", "Send one photo at a time.");

export const unexpectedFields = () => new AppError("BAD_REQUEST", "The upload has more or longer form fields than expected.");

export const CHOOSE_A_PHOTO = "Choose a photo to upload.";
