// Upload and body limits of the layout feature, in one place so the HTTP server's request gate
// registers the same paths with the same numbers (server/gate/limits.test.ts checks they agree).
import { LAYOUT_BODY_MAX_BYTES } from "./schemas";

/** A roof drawing or aerial image: 10 MiB at most, enforced while the upload streams in. */
export const BACKDROP_MAX_BYTES = 10 * 1024 * 1024;
/** The whole multipart request: the image plus room for its part headers. */
export const BACKDROP_REQUEST_MAX_BYTES = BACKDROP_MAX_BYTES + 64 * 1024;
/** Pixels decoded at most (a decompression-bomb guard): 100 megapixels. */
export const BACKDROP_MAX_PIXELS = 100_000_000;

export { LAYOUT_BODY_MAX_BYTES };

/** Paths that accept bodies larger than the gate's default, with their limits (route patterns as in app/routes.ts). */
export const layoutUploadLimits = [
  { path: "/api/v1/sites/:siteId/surfaces", maxBytes: LAYOUT_BODY_MAX_BYTES },
  { path: "/api/v1/sites/:siteId/backdrop", maxBytes: BACKDROP_REQUEST_MAX_BYTES },
] as const;
