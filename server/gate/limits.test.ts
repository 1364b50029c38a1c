// The gate lets each upload route's body through at the size the route itself enforces: the
// features' limit modules and the gate's table name the same paths and numbers.
import { describe, expect, it } from "vitest";
import { layoutUploadLimits } from "~/features/layout/limits";
import { visitUploadLimits } from "~/features/visits/limits";
import { emitterUploadLimits } from "~/features/emitters/limits";
import { bodyLimitFor, DEFAULT_BODY_LIMIT, largeBodyRoutes } from "./limits.mjs";

const featureLimits = [...visitUploadLimits, ...layoutUploadLimits, ...emitterUploadLimits];

describe("large-body routes", () => {
  it("lists every feature's upload path with the feature's own limit", () => {
    for (const { path, maxBytes } of featureLimits) {
      expect(largeBodyRoutes.find((r) => r.path === path)?.limit, path).toBe(maxBytes);
    }
  });

  it("gives a listed path its limit and the stream, and any other path the default", () => {
    expect(bodyLimitFor("/api/v1/visits/abc/photos")).toEqual({ limit: visitUploadLimits[0].maxBytes, streamed: true });
    expect(bodyLimitFor("/api/v1/visits/abc/photos/extra")).toEqual({ limit: DEFAULT_BODY_LIMIT, streamed: false });
    expect(bodyLimitFor("/sites/abc")).toEqual({ limit: DEFAULT_BODY_LIMIT, streamed: false });
  });
});
