// The per-emitter runs give exactly what one engine request over the whole list gives (common
// practice, no source: the engine prepares and evaluates each emitter by itself, engine README).
import { describe, expect, it } from "vitest";
import { evaluate } from "~/engine";
import { createEmitterMemo } from "./emitter-memo";
import { engineEmitters, type InventoryEmitter } from "./engine-inputs";
import { optionsSchema } from "./options";
import { readingsRequest, type SiteReading } from "./readings";
import { otherTierDistancesRequest, type LayoutSurface } from "./requests";

const emitter = (id: string, over: Partial<InventoryEmitter>): InventoryEmitter => ({
  id, label: id, frequencyMHz: 1900, powerPerCarrierW: 40, carriers: 2, lossDb: 1, gainDbi: 15, patternId: null, pattern: null, hBeamwidthDeg: 65, vBeamwidthDeg: 10,
  azimuthDeg: 90, mechanicalTiltDeg: 0, electricalTiltDeg: 2, x: 0, y: 5, z: 2, model: null, apertureM: null, dishDiameterM: null, dutyFactor: 1, actualMaxFactor: 1, tddFactor: 1, active: true, ...over,
});
const o = optionsSchema.parse({ standard: "fcc", tier: "general", gridStepM: 0.5 });
const surfaces: LayoutSurface[] = [{ id: "roof", name: "Roof", kind: "area", polygon: [[0, 0], [16, 0], [16, 10], [0, 10]], line: null, elevationM: 3, bottomM: null, topM: null, access: "workers" }];
const reading = (id: string, x: number, y: number): SiteReading => ({ id, label: id, visitId: "v", visitedOn: "2026-11-20", surfaceId: "roof", x, y, heightM: 1.5, value: 3, unit: "W/m2", frequencyMHz: null, powerDensityWm2: 3, percentStandard: null, percentTier: null });
const readings = [reading("r1", 4, 5), reading("r2", 12, 1)];
const inventory = [
  emitter("A", { powerPerCarrierW: 60 }),
  emitter("B", { frequencyMHz: 739, x: 16, y: 2, azimuthDeg: 300, model: "cylindrical", apertureM: 2 }),
  emitter("C", { frequencyMHz: 28000, x: 8, y: 10, azimuthDeg: 180, hBeamwidthDeg: null, vBeamwidthDeg: null }),
];

describe("emitter memo", () => {
  const memo = createEmitterMemo(o, readings, surfaces);
  const lists = [inventory, [inventory[1], inventory[2]], inventory.map((e) => (e.id === "A" ? { ...e, powerPerCarrierW: 30 } : e)), inventory];
  for (const [k, list] of lists.entries()) {
    const { emitters } = engineEmitters(list, new Map(), o);
    it(`figures equal one request per tier over the list (${k})`, () => {
      const general = evaluate({ ...otherTierDistancesRequest(emitters, o), tier: "general" });
      const occupational = evaluate({ ...otherTierDistancesRequest(emitters, o), tier: "occupational" });
      expect(memo.figures(emitters)).toEqual(
        emitters.map((_, i) => ({ eirpW: occupational.emitters[i].eirpW, erpW: occupational.emitters[i].erpW, general: general.emitters[i].complianceDistanceM, occupational: occupational.emitters[i].complianceDistanceM })),
      );
    });
    it(`readings equal one request over the list, to the bit (${k})`, () => {
      const whole = evaluate(readingsRequest(readings, surfaces, emitters, o)!).points!;
      const mine = memo.readings(emitters)!.points!;
      expect(mine).toEqual(whole);
      mine.forEach((p, i) => expect(Object.is(p.totalPercent, whole[i].totalPercent)).toBe(true));
    });
  }

  it("has nothing to predict without readings or emitters", () => {
    expect(createEmitterMemo(o, [], surfaces).readings(engineEmitters(inventory, new Map(), o).emitters)).toBeNull();
    expect(memo.readings([])).toBeNull();
  });

  it("names a refused emitter by its place in the list, as one request over the list does", () => {
    const bad = [...inventory, emitter("D", { frequencyMHz: 0.1 })];
    const { emitters } = engineEmitters(bad, new Map(), o);
    const fieldOf = (run: () => unknown) => {
      try {
        run();
      } catch (error) {
        return (error as { field?: string }).field;
      }
      return "no error";
    };
    const whole = fieldOf(() => evaluate({ ...otherTierDistancesRequest(emitters, o), tier: "general" }));
    expect(whole).toBe("emitters[3].frequencyMHz");
    expect(fieldOf(() => createEmitterMemo(o, readings, surfaces).figures(emitters))).toBe(whole);
    expect(fieldOf(() => createEmitterMemo(o, readings, surfaces).readings(emitters))).toBe(whole);
  });
});
