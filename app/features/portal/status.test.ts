import { describe, expect, it } from "vitest";
import { partOf, siteStatus, statusLine, type StatusSource } from "./status";

// Classes as exposure/mitigation.ts defines them (47 CFR §1.1307(b)(2)/(b)(4)); the figures are made up.
const areas = (within: number, c1: number, c2: number, c3: number) => ({ totalM2: within + c1 + c2 + c3, withinGeneralM2: within, overGeneralM2: c1 + c2 + c3, overOccupationalM2: c2 + c3, overTenTimesOccupationalM2: c3 });
const roof: [number, number][] = [[0, 0], [30, 0], [30, 18], [0, 18]];
const source = (over: Partial<StatusSource> = {}): StatusSource => ({
  summary: { worstPercent: 42 },
  results: { surfaces: [{ surfaceId: "s1", name: "Main roof", kind: "area", worstPercent: 42, worstClass: 0, areas: areas(540, 0, 0, 0) }] },
  inventory: { surfaces: [{ id: "s1", polygon: roof }] },
  mitigation: { zones: [], signs: [] },
  ...over,
});

describe("siteStatus", () => {
  it("calls a site compliant when every surface is within the public limit", () => {
    const s = siteStatus(source());
    expect(s).toMatchObject({ compliant: true, worstPercent: 42, classesPresent: [0], keepOut: [], lockedAccess: [] });
    expect(statusLine(s)).toMatch(/^Compliant/);
  });

  it("lists the surfaces above the public limit, worst class first, with their zones placed in plain words", () => {
    const s = siteStatus(source({
      summary: { worstPercent: 1450 },
      results: { surfaces: [
        { surfaceId: "s1", name: "Main roof", kind: "area", worstPercent: 320, worstClass: 2, areas: areas(500, 30, 10, 0) },
        { surfaceId: "s2", name: "Penthouse top", kind: "area", worstPercent: 1450, worstClass: 3, areas: areas(20, 4, 3, 1) },
        { surfaceId: "f1", name: "East facade", kind: "facade", worstPercent: 60, worstClass: 0, areas: areas(80, 0, 0, 0) },
      ] },
      inventory: { surfaces: [{ id: "s1", polygon: roof }, { id: "s2", polygon: [[10, 6], [16, 6], [16, 12], [10, 12]] }] },
      mitigation: {
        zones: [
          { id: "z1", surfaceId: "s1", surfaceName: "Main roof", worstClass: 1, areaM2: 30, centre: [27, 16], powerDown: { emitters: [] } as never },
          { id: "z2", surfaceId: "s1", surfaceName: "Main roof", worstClass: 2, areaM2: 6, centre: [4, 2], powerDown: { emitters: [] } as never },
          { id: "z3", surfaceId: "s1", surfaceName: "Main roof", worstClass: 2, areaM2: 4, centre: [25, 14], powerDown: { emitters: [] } as never },
        ],
        signs: [
          { id: "a1", category: "caution", x: 29, y: 1, z: 0, surfaceId: "s1", origin: "access-point", accessPointId: "p1", where: "Stair door (door), onto Main roof", note: "" },
          { id: "a2", category: "information", x: 1, y: 1, z: 0, surfaceId: "s1", origin: "access-point", accessPointId: "p2", where: "Fire exit (door), onto Main roof", note: "" },
          { id: "b1", category: "notice", x: 20, y: 10, z: 0, surfaceId: "s1", origin: "boundary", accessPointId: null, where: "Main roof: where the NOTICE zone begins", note: "" },
        ],
      },
    }));
    expect(s.compliant).toBe(false);
    expect(s.classesPresent).toEqual([0, 1, 2, 3]);
    expect(s.keepOut.map((k) => [k.name, k.worstClass, k.overGeneralM2])).toEqual([["Penthouse top", 3, 8], ["Main roof", 2, 40]]);
    // Two zones in the north-east third read as one place.
    expect(s.keepOut[1].zones).toEqual([{ areaM2: 34, worstClass: 2, where: "the north-east part" }, { areaM2: 6, worstClass: 2, where: "the south-west part" }]);
    expect(s.keepOut[0].rule).toMatch(/Keep everyone out while the antennas transmit/);
    // Only the access points whose sign asks for control; the optional INFORMATION sign's door stays open.
    expect(s.lockedAccess).toEqual(["Stair door"]);
    expect(statusLine(s)).toBe("2 areas to keep people out of");
  });

  it("is not compliant when the worst point passes 100 % even if no area is classed above the public limit (a facade's points)", () => {
    expect(siteStatus(source({ summary: { worstPercent: 120 } })).compliant).toBe(false);
  });
});

describe("partOf", () => {
  it("names the third of the outline's box a point falls in, north up (common practice, no source)", () => {
    expect(partOf(roof, [15, 9])).toBe("the middle");
    expect(partOf(roof, [2, 17])).toBe("the north-west part");
    expect(partOf(roof, [15, 1])).toBe("the south part");
    expect(partOf(roof, [29, 9])).toBe("the east part");
  });
});
