export type Size = { width: number; height: number };

// The largest size with the photo's own aspect ratio that fits the box, so a placement photo is never stretched or
// cropped: cutting off the edge of a photo could cut off the electrode it shows.
export function fitWithin(photo: Size, box: Size): Size {
  if (!(photo.width > 0 && photo.height > 0)) return { width: 0, height: 0 };
  const scale = Math.min(box.width / photo.width, box.height / photo.height);
  return { width: photo.width * scale, height: photo.height * scale };
}
