// A whole site through the engine: areas by class, worst points, contributions and compliance
// distances against hand computations with the far-field formula S = EIRP / (4πR²)
// (FCC OET Bulletin 65, Edition 97-01, eq. (3), reflection factor 1).
import { describe, expect, it } from "vitest";
import type { InventoryEmitter } from "./engine-inputs";
import { evaluateSite, type SiteInventory } from "./evaluate-site";
import { optionsSchema } from "./options";
import type { LayoutSurface } from "./requests";

// FCC general population limit above 1500 MHz: 1.0 mW/cm² = 10 W/m²; occupational 5.0 mW/cm² = 50 W/m²
// (47 CFR §1.1310(e)(1), Table 1). An isotropic emitter of EIRP 1000π W gives 10 W/m² at 5 m.
const eirp = 1000 * Math.PI;
const emitter: InventoryEmitter = {
  id: "e1", label: "ISO", frequencyMHz: 1900, powerPerCarrierW: eirp, carriers: 1, lossDb: 0, gainDbi: 0,
  patternId: null, pattern: null, hBeamwidthDeg: null, vBeamwidthDeg: null, azimuthDeg: 0, mechanicalTiltDeg: 0, electricalTiltDeg: 0,
  x: 0, y: 0, z: 1, model: null, apertureM: null, dishDiameterM: null, dutyFactor: 1, actualMaxFactor: 1, tddFactor: 1, active: true,
};
const roof: LayoutSurface = { id: "roof", name: "Roof", kind: "area", polygon: [[-10, -10], [10, -10], [10, 10], [-10, 10]], line: null, elevationM: 0, bottomM: null, topM: null, access: "workers" };
const facade: LayoutSurface = { id: "wall", name: "Wall", kind: "facade", polygon: null, line: [[3, -5], [3, 5]], elevationM: null, bottomM: -2, topM: 4, access: "public" };
const inventory: SiteInventory = { surfaces: [roof, facade], emitters: [emitter], patterns: new Map() };
// One height, 1 m above the roof, level with the emitter: the horizontal distance is the distance.
const options = optionsSchema.parse({ standard: "fcc", tier: "general", gridStepM: 0.25, heights: { fromM: 1, toM: 1, count: 1 } });

describe("evaluateSite", () => {
  const site = evaluateSite(inventory, options);
  const area = site.surfaces.find((s) => s.surfaceId === "roof")!;

  it("finds the areas above each limit: discs of radius 5 m, √5 m and √0.5 m", () => {
    // S > 10 W/m² within R = 5 m; > 50 W/m² within √(EIRP/(4π·50)) = √5 m; > 500 W/m² within √0.5 m.
    expect(area.areas.overGeneralM2 / (Math.PI * 25)).toBeCloseTo(1, 1);
    expect(area.areas.overOccupationalM2 / (Math.PI * 5)).toBeCloseTo(1, 1);
    expect(area.areas.overTenTimesOccupationalM2).toBeGreaterThan(0.5);
    expect(area.areas.overTenTimesOccupationalM2).toBeLessThan(2.5);
    expect(area.areas.totalM2).toBeCloseTo(400, 0); // the outline: 20 m × 20 m
    expect(area.worstClass).toBe(3);
  });

  it("reports the worst point of the area and the largest value over the runs", () => {
    expect(area.worstAt).toMatchObject({ x: 0, y: 0, z: 0 });
    const gridMax = site.runs[0].response.grid!.maxPercent;
    expect(area.worstPercent).toBe(gridMax);
    const overRuns = Math.max(...site.runs.map((r) => Math.max(r.response.grid?.maxPercent ?? 0, ...(r.response.points ?? []).map((p) => p.totalPercent))));
    expect(site.summary.worstPercent).toBe(overRuns);
  });

  it("gives the worst point's contributions, which add up to its total", () => {
    const sum = area.contributions.reduce((s, c) => s + c.percent, 0);
    expect(area.contributions[0].id).toBe("ISO");
    expect(sum).toBeCloseTo(area.worstPercent, 3);
  });

  it("evaluates a facade on its vertical grid: worst point level with the emitter, 3 m away", () => {
    const wall = site.surfaces.find((s) => s.surfaceId === "wall")!;
    expect(wall.worstAt).toMatchObject({ x: 3, y: 0, z: 1 });
    // S = 1000π/(4π·9) = 27.78 W/m² = 277.8 % of 10 W/m².
    expect(wall.worstPercent).toBeCloseTo(277.78, 1);
    expect(wall.worstClass).toBe(1);
  });

  it("gives every emitter's compliance distance for both tiers: R = √(EIRP/(4π·S_limit))", () => {
    expect(site.emitters[0].complianceDistanceM.general).toBeCloseTo(5, 3);
    expect(site.emitters[0].complianceDistanceM.occupational).toBeCloseTo(Math.sqrt(5), 3);
    expect(site.summary.emitters[0]).toMatchObject({ id: "ISO", label: "ISO" });
  });

  it("leaves switched-off emitters out, and a site with none on air has no runs", () => {
    const off = evaluateSite({ ...inventory, emitters: [{ ...emitter, active: false }] }, options);
    expect(off.runs).toEqual([]);
    expect(off.summary.worstPercent).toBe(0);
  });

  it("averages over the span for the spatial average: lower than the peak at the emitter's height", () => {
    const averaged = evaluateSite(inventory, optionsSchema.parse({ standard: "fcc", tier: "general", gridStepM: 0.5, heights: { fromM: 0, toM: 2, count: 11 } }));
    const wall = averaged.surfaces.find((s) => s.surfaceId === "wall")!;
    const area2 = averaged.surfaces.find((s) => s.surfaceId === "roof")!;
    expect(area2.worstPercent).toBeLessThan(area.worstPercent);
    expect(wall.worstPercent).toBeCloseTo(277.78, 1); // the facade keeps its own vertical grid
  });
});
