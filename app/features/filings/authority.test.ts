import { describe, expect, it } from "vitest";
import { authorityFromName } from "./authority";

describe("authorityFromName", () => {
  it("takes the office in brackets at the end of a regulator's name", () => {
    expect(authorityFromName("Osric Vey (Spectrum Safety Office)")).toBe("Spectrum Safety Office");
    expect(authorityFromName("  A. Reader ( Radio Branch )  ")).toBe("Radio Branch");
  });
  it("falls back to the whole name, trimmed and at most 120 characters", () => {
    expect(authorityFromName("Coastal Licensing Board")).toBe("Coastal Licensing Board");
    expect(authorityFromName("x".repeat(200))).toHaveLength(120);
    expect(authorityFromName("Name (with) more")).toBe("Name (with) more");
  });
});
