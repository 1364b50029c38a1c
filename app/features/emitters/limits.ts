// Body limits of the emitters feature, so the request gate registers the same paths and numbers.
import { EMITTER_CSV_MAX_BYTES } from "./csv";
import { PATTERN_CSV_MAX_BYTES } from "./pattern-csv";

/** A site's whole emitter list as JSON (PUT): 2 MiB, room for a thousand emitters. */
export const EMITTERS_JSON_MAX_BYTES = 2 * 1024 * 1024;
/** A library pattern as JSON: two cuts of up to 3600 points each fit in 1 MiB. */
export const PATTERN_JSON_MAX_BYTES = PATTERN_CSV_MAX_BYTES;

export const emitterUploadLimits = [
  { path: "/api/v1/sites/:siteId/emitters", maxBytes: EMITTERS_JSON_MAX_BYTES },
  { path: "/api/v1/sites/:siteId/emitters/csv", maxBytes: EMITTER_CSV_MAX_BYTES },
  { path: "/api/v1/patterns", maxBytes: PATTERN_JSON_MAX_BYTES },
] as const;
