// Upload and import limits of the visits feature, in one place so the HTTP server's request
// gate can register the upload paths with the same numbers.

/** A photo's largest size: 10 MiB. Enforced while the upload streams in. */
export const PHOTO_MAX_BYTES = 10 * 1024 * 1024;
/** The whole multipart request of one photo: the photo plus room for its caption and headers. */
export const PHOTO_REQUEST_MAX_BYTES = PHOTO_MAX_BYTES + 64 * 1024;
/** Pixels decoded from one photo at most (a decompression-bomb guard): 100 megapixels. */
export const PHOTO_MAX_PIXELS = 100_000_000;
/** Thumbnails fit inside this many pixels on each side. */
export const THUMB_MAX_PX = 480;

/** A readings CSV (or JSON) body's largest size: 2 MiB. */
export const READINGS_BODY_MAX_BYTES = 2 * 1024 * 1024;
/** Readings per import at most. */
export const READINGS_MAX_ROWS = 5000;

/** Paths that accept bodies larger than the gate's default, with their limits (route patterns as in app/routes.ts). */
export const visitUploadLimits = [
  { path: "/api/v1/visits/:visitId/photos", maxBytes: PHOTO_REQUEST_MAX_BYTES },
  { path: "/api/v1/visits/:visitId/readings", maxBytes: READINGS_BODY_MAX_BYTES },
] as const;
