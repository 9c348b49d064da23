// Where the app serves a stored photo; the only way to read one (there is no public folder of uploads).
export const photoUrl = (photoId: string) => `/api/photos/${encodeURIComponent(photoId)}`;
export const photoThumbnailUrl = (photoId: string) => `${photoUrl(photoId)}?size=thumb`;
