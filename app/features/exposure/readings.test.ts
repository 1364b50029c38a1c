// Readings against predictions, checked with the far-field formula S = EIRP/(4πR²)
// (FCC OET Bulletin 65, Edition 97-01, eq. (3), reflection factor 1).
import { describe, expect, it } from "vitest";
import { evaluate, type EmitterInput } from "~/engine";
import { optionsSchema } from "./options";
import { compareReadings, readingPoints, readingsRequest, type SiteReading } from "./readings";
import type { LayoutSurface } from "./requests";

// EIRP 1000π W isotropic at (0, 0, 6): S = 1000π/(4πR²) = 250/R² W/m². At 1900 MHz the FCC general
// population limit is 1.0 mW/cm² = 10 W/m² (47 CFR §1.1310(e)(1), Table 1 (B)).
const emitters: EmitterInput[] = [{ id: "ISO", frequencyMHz: 1900, powerW: 1000 * Math.PI, lossDb: 0, gainDbi: 0, position: { x: 0, y: 0, z: 6 }, azimuthDeg: 0, tiltDeg: 0, pattern: "isotropic", model: "spherical", reflectionFactor: 1, dutyFactor: 1 }];
const surfaces: LayoutSurface[] = [{ id: "upper", name: "Upper", kind: "area", polygon: [[-10, -10], [10, -10], [10, 10], [-10, 10]], line: null, elevationM: 4, bottomM: null, topM: null, access: "workers" }];
const o = optionsSchema.parse({ standard: "fcc", tier: "general" });
const reading = (over: Partial<SiteReading>): SiteReading => ({
  id: "r", label: "R", visitId: "v", visitedOn: "2026-11-20", surfaceId: "upper", x: 5, y: 0, heightM: 2, value: 0, unit: "W/m2", frequencyMHz: null, powerDensityWm2: null, percentStandard: null, percentTier: null, ...over,
});

describe("readings against predictions", () => {
  // At (5, 0) and 2 m above the 4 m level, the point is level with the emitter: R = 5 m, S = 10 W/m² = 100 %.
  const readings = [
    reading({ id: "below", label: "half", powerDensityWm2: 5, value: 5 }),
    reading({ id: "above", label: "double", x: 0, y: 5, powerDensityWm2: 20, value: 20 }),
    reading({ id: "tuned", label: "at 1900 MHz", x: -5, y: 0, powerDensityWm2: 12, value: 12, frequencyMHz: 1900 }),
    reading({ id: "pct", label: "in %", x: 0, y: -5, unit: "percent", value: 80, percentStandard: "fcc", percentTier: "general" }),
    reading({ id: "other", label: "% of ICNIRP", unit: "percent", value: 80, percentStandard: "icnirp-2020", percentTier: "general" }),
  ];
  const request = readingsRequest(readings, surfaces, emitters, o)!;
  const result = compareReadings(readings, surfaces, evaluate(request), o);
  const by = (id: string) => result.rows.find((r) => r.id === id)!;

  it("puts each reading at its surface's elevation plus its height", () => {
    expect(readingPoints(readings, surfaces)[0]).toMatchObject({ x: 5, y: 0, z: 6 });
    expect(readingPoints([reading({ surfaceId: null, heightM: 1.5 })], surfaces)[0].z).toBe(1.5);
  });

  it("compares broadband readings by power density: ratio = measured / predicted", () => {
    expect(by("below").predictedPercent).toBeCloseTo(100, 3);
    expect(by("below").ratio).toBeCloseTo(0.5, 6);
    expect(by("below").measuredPercent).toBeCloseTo(50, 3);
    expect(by("below").abovePrediction).toBe(false);
    expect(by("above").ratio).toBeCloseTo(2, 6);
    expect(by("above").abovePrediction).toBe(true);
  });

  it("puts a reading with a frequency in % of that frequency's limit (12 W/m² of 10 W/m² = 120 %)", () => {
    expect(by("tuned").measuredPercent).toBeCloseTo(120, 6);
    expect(by("tuned").basis).toBe("power density");
  });

  it("takes a % reading of the same standard and tier as it is, and leaves another standard's % uncompared", () => {
    expect(by("pct").ratio).toBeCloseTo(0.8, 4);
    expect(by("other").basis).toBe("not comparable");
    expect(by("other").ratio).toBeNull();
  });

  it("summarises: how many above their prediction, the worst ratio and where", () => {
    expect(result.summary).toMatchObject({ count: 5, compared: 4, above: 2, worst: { id: "above", x: 0, y: 5, z: 6 } });
    expect(result.summary.worst!.ratio).toBeCloseTo(2, 6);
  });

  it("flags a reading where nothing is predicted as above its prediction, with no ratio", () => {
    const none = compareReadings([reading({ powerDensityWm2: 0.1 })], surfaces, null, o);
    expect(none.rows[0]).toMatchObject({ ratio: null, abovePrediction: true, predictedPercent: 0 });
    expect(none.summary.above).toBe(1);
  });
});
