// A placement photo ready for the PDF: the stored bytes and the size they were saved at, for the aspect ratio.
export type HandoutPhoto = { data: Buffer; format: "jpg" | "png"; width: number; height: number };

// The programme allows 4 per channel; the handout never prints more even if an older version held more.
export const MAX_PHOTOS_PER_CHANNEL = 4;
