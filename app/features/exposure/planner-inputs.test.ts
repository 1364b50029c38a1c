// The work-area planner around the engine. Values against S = EIRP/(4πR²) (FCC OET Bulletin 65,
// Edition 97-01, eq. (3)) and the FCC limits above 1500 MHz (47 CFR §1.1310(e)(1), Table 1:
// 10 W/m² general population, 50 W/m² occupational); power scales linearly with the factor, so a
// reduction of 10·log10(before/target) dB brings the worst point to the target (common practice, no source).
import { describe, expect, it } from "vitest";
import { evaluate, type EmitterInput } from "~/engine";
import { optionsSchema } from "./options";
import { runPlanner } from "./planner-compute";
import { addCorner } from "./planner-drawing";
import { applyPlan, describeChange, levelRequests, levelUnder, plannerRequest, polygonArea } from "./planner-inputs";
import type { LayoutSurface } from "./requests";

const iso = (id: string, x: number, y: number, z = 1, powerW = 1000 * Math.PI): EmitterInput => ({ id, frequencyMHz: 1900, powerW, gainDbi: 0, position: { x, y, z } }) as EmitterInput;
const roof: LayoutSurface = { id: "roof", name: "Roof", kind: "area", polygon: [[-10, -10], [10, -10], [10, 10], [-10, 10]], line: null, elevationM: 0, bottomM: null, topM: null, access: "workers" };
const deck: LayoutSurface = { ...roof, id: "deck", name: "Deck", polygon: [[0, 0], [4, 0], [4, 4], [0, 4]], elevationM: 3 };
const options = optionsSchema.parse({ standard: "fcc", tier: "general", gridStepM: 0.25, heights: { fromM: 1, toM: 1, count: 1 } });
const square = (x: number, y: number, s: number): [number, number][] => [[x, y], [x + s, y], [x + s, y + s], [x, y + s]];

describe("planner inputs", () => {
  it("builds the request: grid aligned to the step over the area's box, heights above its level, the area as mask and work area", () => {
    const r = plannerRequest(square(1.1, 2.3, 2), 3, [iso("A", 0, 0)], { ...options, heights: { fromM: 0, toM: 2, count: 11 } }, "occupational");
    expect(r.tier).toBe("occupational");
    expect(r.grid).toMatchObject({ x0: 1, y0: 2.25, x1: 3.1, y1: 4.3, step: 0.25, z0: 3, z1: 5, zCount: 11, mode: "average", polygons: [square(1.1, 2.3, 2)] });
    expect(r.workArea).toEqual({ polygon: square(1.1, 2.3, 2), tier: "occupational", targetPercent: 100 });
  });

  it("applies a plan: switched-off emitters left out, reduced ones with their power factor in the duty factor", () => {
    const after = applyPlan([iso("A", 0, 0), { ...iso("B", 1, 1), dutyFactor: 0.5 }, iso("C", 2, 2)], [
      { id: "A", powerFactor: 0, reductionDb: null, switchOff: true },
      { id: "B", powerFactor: 0.25, reductionDb: 6.02, switchOff: false },
    ]);
    expect(after.map((e) => [e.id, e.dutyFactor ?? 1])).toEqual([["B", 0.125], ["C", 1]]);
  });

  it("finds the level under an area (the highest holding its centre) and the map's requests on that level", () => {
    expect(levelUnder(square(1, 1, 2), [roof, deck])?.id).toBe("deck");
    expect(levelUnder(square(6, 6, 2), [roof, deck])?.id).toBe("roof");
    expect(levelUnder(square(30, 30, 2), [roof, deck])).toBeNull();
    expect(levelRequests([roof, deck], 3, [iso("A", 0, 0)], options, "general").map((r) => r.surface.id)).toEqual(["deck"]);
    expect(levelRequests([roof, deck], 3, [], options, "general")).toEqual([]);
  });

  it("measures polygons and words the changes", () => {
    expect(polygonArea(square(0, 0, 3))).toBe(9);
    expect(describeChange({ id: "A", powerFactor: 0.5, reductionDb: 3.0103, switchOff: false })).toBe("−3.0 dB (to 50 % of power)");
    expect(describeChange({ id: "A", powerFactor: 0, reductionDb: null, switchOff: true })).toBe("switch off");
  });
});

describe("planner run", () => {
  it("reduces the one emitter by 10·log10(max/100) dB and the map after stays within the limit in the area", () => {
    // Work area 3–4 m east of the emitter at its height: worst at 3 m, (5/3)² × 100 % = 277.8 % of the general limit.
    const area = square(3, -0.5, 1);
    const r = runPlanner(area, roof, [roof], [iso("A", 0, 0)], options, "general");
    expect(r.plan.maxPercentBefore).toBeCloseTo(277.78, 1);
    expect(r.plan.changes).toHaveLength(1);
    expect(r.plan.changes[0].reductionDb).toBeCloseTo(10 * Math.log10(277.78 / 100), 2); // 4.44 dB
    expect(r.plan.feasible).toBe(true);
    const after = r.after[0];
    const inArea = after.percent.filter((_, c) => {
      const x = after.x0 + (c % after.nx) * after.step;
      const y = after.y0 + Math.floor(c / after.nx) * after.step;
      return x >= 3 && x <= 4 && y >= -0.5 && y <= 0.5;
    });
    expect(Math.max(...inArea)).toBeLessThanOrEqual(100 + 1e-6);
    expect(Math.max(...r.before[0].percent)).toBeGreaterThan(Math.max(...after.percent));
  });

  it("turns off the emitter that dominates and leaves the work area's own limit to the chosen tier", () => {
    // Occupational (50 W/m²): at 1 m from A, 25 × 5²/1² … A alone gives 500 % of it; B far away gives little.
    const r = runPlanner(square(0.75, -0.25, 0.5), roof, [roof], [iso("A", 0, 0), iso("B", -8, -8)], options, "occupational");
    expect(r.plan.changes.map((c) => c.id)).toEqual(["A"]);
    expect(r.plan.maxPercentAfter).toBeLessThanOrEqual(100);
    // The planner's figures are the engine's: the same request straight through evaluate.
    const direct = evaluate(plannerRequest(square(0.75, -0.25, 0.5), 0, [iso("A", 0, 0), iso("B", -8, -8)], options, "occupational")).workArea;
    expect(r.plan).toEqual(direct);
  });
});

describe("drawing a polygon", () => {
  it("snaps corners, ignores a double click, closes near the first corner and starts again after", () => {
    let d = { points: [] as [number, number][], closed: false };
    d = addCorner(d, [1.1, 0.95]);
    d = addCorner(d, [1.1, 0.95]);
    d = addCorner(d, [5.02, 1.1]);
    d = addCorner(d, [5, 4.9]);
    expect(d).toEqual({ points: [[1, 1], [5, 1], [5, 5]], closed: false });
    d = addCorner(d, [1.3, 1.2]); // within 0.75 m of the first corner
    expect(d.closed).toBe(true);
    expect(addCorner(d, [9, 9])).toEqual({ points: [[9, 9]], closed: false });
  });
});
