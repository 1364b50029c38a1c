// The mitigation proposal on a roof whose classes are known by hand: an isotropic emitter of
// EIRP 1000π W at 1900 MHz, 1 m above the roof, evaluated at 1 m, gives S = EIRP/(4πR²)
// (FCC OET Bulletin 65, Edition 97-01, eq. (3)), so the FCC general-population limit (10 W/m²)
// is reached at R = 5 m, the occupational (50 W/m²) at √5 m and ten times it at √0.5 m
// (47 CFR §1.1310(e)(1), Table 1): three nested discs.
import { describe, expect, it } from "vitest";
import type { InventoryEmitter } from "./engine-inputs";
import { evaluateSite } from "./evaluate-site";
import { mitigationInput, proposeMitigation, signForClass } from "./mitigation";
import { leadsTo, zonesOf, type AccessPoint } from "./mitigation-grid";
import { optionsSchema } from "./options";
import type { LayoutSurface } from "./requests";

const emitter = (id: string, eirpW: number, x: number, y: number): InventoryEmitter => ({
  id, label: id, frequencyMHz: 1900, powerPerCarrierW: eirpW, carriers: 1, lossDb: 0, gainDbi: 0,
  patternId: null, pattern: null, hBeamwidthDeg: null, vBeamwidthDeg: null, azimuthDeg: 0, mechanicalTiltDeg: 0, electricalTiltDeg: 0,
  x, y, z: 1, model: null, apertureM: null, dishDiameterM: null, dutyFactor: 1, actualMaxFactor: 1, tddFactor: 1, active: true,
});
const roof = (access: LayoutSurface["access"]): LayoutSurface => ({ id: "roof", name: "Roof", kind: "area", polygon: [[-10, -10], [10, -10], [10, 10], [-10, 10]], line: null, elevationM: 0, bottomM: null, topM: null, access });
const door: AccessPoint = { id: "d", name: "Door", kind: "door", x: -10, y: 0, z: 0, locked: false };
const options = optionsSchema.parse({ standard: "fcc", tier: "general", gridStepM: 0.25, heights: { fromM: 1, toM: 1, count: 1 } });

function plan(surface: LayoutSurface, emitters: InventoryEmitter[], accessPoints: AccessPoint[] = [door], obstructions: { polygon: [number, number][]; baseM: number; heightM: number }[] = []) {
  const site = evaluateSite({ surfaces: [surface], emitters, patterns: new Map() }, options);
  return proposeMitigation(mitigationInput(site, [surface], accessPoints, obstructions, options));
}

describe("signs by class (47 CFR §1.1307(b)(2) and (b)(4))", () => {
  it("maps the four classes to INFORMATION, NOTICE, CAUTION and WARNING", () => {
    expect([0, 1, 2, 3].map(signForClass)).toEqual(["information", "notice", "caution", "warning"]);
  });
});

describe("proposeMitigation on the three discs", () => {
  const p = plan(roof("workers"), [emitter("ISO", 1000 * Math.PI, 0, 0), emitter("FAR", 50, 30, 30)]);

  it("puts the sign of the roof's worst class at the door, asking for access control when it is not locked", () => {
    const atDoor = p.signs.filter((s) => s.origin === "access-point");
    expect(atDoor).toHaveLength(1);
    expect(atDoor[0]).toMatchObject({ category: "warning", accessPointId: "d", x: -10, y: 0 });
    expect(atDoor[0].note).toMatch(/positive access control/);
  });

  it("puts a sign where the walk from the door meets each zone, just outside it: at R = 5, √5 and √0.5 m", () => {
    const boundary = p.signs.filter((s) => s.origin === "boundary");
    const expected = { notice: 5, caution: Math.sqrt(5), warning: Math.sqrt(0.5) };
    for (const [category, radius] of Object.entries(expected)) {
      const sign = boundary.filter((s) => s.category === category);
      expect(sign, category).toHaveLength(1);
      const r = Math.hypot(sign[0].x, sign[0].y);
      // The last cell outside the disc on the way in: between R and R + one diagonal step.
      expect(r).toBeGreaterThanOrEqual(radius - 1e-9);
      expect(r).toBeLessThanOrEqual(radius + 0.25 * Math.SQRT2);
      expect(sign[0].x).toBeLessThan(0); // on the door's side
    }
  });

  it("draws barriers along the two 100 % lines: circles of 2π·5 and 2π·√5 m", () => {
    const general = p.barriers.find((b) => b.boundary === "general")!;
    const occupational = p.barriers.find((b) => b.boundary === "occupational")!;
    // Traced on the 0.25 m class grid in straight and 45° steps, which run a little long (within 10 %; common practice, no source).
    for (const [barrier, radius] of [[general, 5], [occupational, Math.sqrt(5)]] as const) {
      expect(barrier.lengthM / (2 * Math.PI * radius)).toBeGreaterThan(0.97);
      expect(barrier.lengthM / (2 * Math.PI * radius)).toBeLessThan(1.1);
    }
  });

  it("lists for work in the zone the emitters over 5 % of their limit there, for both tiers", () => {
    expect(p.zones).toHaveLength(1);
    const zone = p.zones[0];
    expect(zone.worstClass).toBe(3);
    expect(zone.areaM2 / (Math.PI * 25)).toBeCloseTo(1, 1);
    expect(zone.powerDown.general.map((e) => e.id)).toEqual(["ISO"]); // FAR: 50 W EIRP some 35 m away is far below 5 %
    expect(zone.powerDown.occupational.map((e) => e.id)).toEqual(["ISO"]);
    // The occupational share is the general one scaled by the two limits, 10/50 W/m².
    expect(zone.powerDown.occupational[0].maxPercent).toBeCloseTo(zone.powerDown.general[0].maxPercent / 5, 3);
  });
});

describe("where nobody may walk, and where the zone meets the roof edge", () => {
  it("gives a roof with no access only the access-point sign and the power-down list", () => {
    const p = plan(roof("none"), [emitter("ISO", 1000 * Math.PI, 0, 0)]);
    expect(p.signs.map((s) => s.origin)).toEqual(["access-point"]);
    expect(p.barriers).toEqual([]);
    expect(p.zones).toHaveLength(1);
  });

  it("draws no barrier along the roof edge: an emitter on the east edge leaves half the circle", () => {
    const p = plan(roof("public"), [emitter("EDGE", 1000 * Math.PI, 10, 0)]);
    const general = p.barriers.find((b) => b.boundary === "general")!;
    expect(general.lengthM / (Math.PI * 5)).toBeCloseTo(1, 1);
  });

  it("draws no barrier through a plant room standing on the roof", () => {
    const plantRoom = { polygon: [[-10, -10], [0, -10], [0, 10], [-10, 10]] as [number, number][], baseM: 0, heightM: 3 };
    const p = plan(roof("public"), [emitter("ISO", 1000 * Math.PI, 0, 0)], [{ ...door, x: 10 }], [plantRoom]);
    const general = p.barriers.find((b) => b.boundary === "general")!;
    expect(general.lengthM / (Math.PI * 5)).toBeCloseTo(1, 1); // the eastern half only
  });
});

describe("access points and zones", () => {
  const polygon: [number, number][] = [[0, 0], [4, 0], [4, 4], [0, 4]];
  it("a door leads onto its own level only; a ladder within 1 m joins levels", () => {
    expect(leadsTo({ ...door, x: 4.5, y: 2, z: 0 }, polygon, 0)).toBe(true);
    expect(leadsTo({ ...door, x: 4.5, y: 2, z: 0 }, polygon, 4.2)).toBe(false);
    expect(leadsTo({ ...door, kind: "ladder", x: 4.5, y: 2, z: 0 }, polygon, 4.2)).toBe(true);
    expect(leadsTo({ ...door, kind: "ladder", x: 5.5, y: 2, z: 0 }, polygon, 4.2)).toBe(false);
  });

  it("groups cells of a class and above into 4-connected zones", () => {
    const g = { x0: 0, y0: 0, step: 1, nx: 4, ny: 2 };
    const classes = [1, 0, 2, 2, 1, 0, 0, 255];
    const { label, count } = zonesOf(g, classes, new Uint8Array([1, 1, 1, 1, 1, 1, 1, 0]), 1);
    expect(count).toBe(2);
    expect(Array.from(label)).toEqual([0, -1, 1, 1, 0, -1, -1, -1]);
  });
});
