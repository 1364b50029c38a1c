// The inventory difference between two assessments (common practice, no source: records matched by id).
import { describe, expect, it } from "vitest";
import { compareAssessments, diffRecords } from "./compare";

const e1 = { id: "e1", label: "NW-A7", powerPerCarrierW: 40, gainDbi: 14.6, position: { x: 30, y: 25.4, z: 6 }, version: 1, eirpW: 100, erpW: 61 };
const e2 = { id: "e2", label: "SM-1", powerPerCarrierW: 20, gainDbi: 15, position: { x: 1, y: 2, z: 3 }, version: 4, eirpW: 50, erpW: 30 };

describe("diffRecords", () => {
  it("finds nothing between equal lists", () => {
    expect(diffRecords([e1, e2], [e1, e2])).toEqual({ added: [], removed: [], changed: [] });
  });

  it("lists each changed field with before and after, and ignores the version and the derived EIRP/ERP", () => {
    const edited = { ...e1, powerPerCarrierW: 20, position: { ...e1.position, z: 6.5 }, version: 2, eirpW: 50, erpW: 30 };
    expect(diffRecords([e1, e2], [edited, e2])).toEqual({
      added: [],
      removed: [],
      changed: [{ id: "e1", label: "NW-A7", fields: [{ field: "powerPerCarrierW", before: 40, after: 20 }, { field: "position.z", before: 6, after: 6.5 }] }],
    });
  });

  it("tells added and removed records apart from renamed ones (matched by id)", () => {
    const renamed = { ...e2, label: "SM-1 new" };
    const e3 = { ...e1, id: "e3", label: "BW-1" };
    const diff = diffRecords([e1, e2], [renamed, e3]);
    expect(diff.added).toEqual([{ id: "e3", label: "BW-1" }]);
    expect(diff.removed).toEqual([{ id: "e1", label: "NW-A7" }]);
    expect(diff.changed).toEqual([{ id: "e2", label: "SM-1 new", fields: [{ field: "label", before: "SM-1", after: "SM-1 new" }] }]);
  });
});

describe("compareAssessments", () => {
  const side = (worst: number, over: number, emitters = [e1]) => ({
    options: { standard: "fcc", tier: "general", gridStepM: 0.25 },
    inventory: { emitters, surfaces: [{ id: "s1", name: "Main roof" }] },
    summary: { worstPercent: worst, areas: [{ surfaceId: "s1", overGeneralM2: over, overOccupationalM2: 0, overTenTimesOccupationalM2: 0 }] },
    results: { surfaces: [{ surfaceId: "s1", name: "Main roof", worstPercent: worst }] },
  });

  it("pairs each surface's worst point and areas, and lists changed options", () => {
    const b = { ...side(120, 4, [{ ...e1, powerPerCarrierW: 20 }]), options: { standard: "fcc", tier: "general", gridStepM: 0.5 } };
    const c = compareAssessments(side(240, 9.5), b);
    expect(c.results.worstPercent).toEqual({ a: 240, b: 120 });
    expect(c.results.surfaces).toEqual([{ surfaceId: "s1", name: "Main roof", worstPercent: { a: 240, b: 120 }, overGeneralM2: { a: 9.5, b: 4 }, overOccupationalM2: { a: 0, b: 0 }, overTenTimesOccupationalM2: { a: 0, b: 0 } }]);
    expect(c.options).toEqual([{ field: "gridStepM", before: 0.25, after: 0.5 }]);
    expect(c.inventory.emitters.changed[0].fields).toEqual([{ field: "powerPerCarrierW", before: 40, after: 20 }]);
    expect(c.inventory.surfaces).toEqual({ added: [], removed: [], changed: [] });
  });
});
