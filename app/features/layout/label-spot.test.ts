import { describe, expect, it } from "vitest";
import { areaLabelBox, areaLabelSpot, lineLabelBox, rectDistance, type Rect } from "./label-spot";
import type { XY } from "./plan-frame";

// Label placement on the plan: common practice, no source.
const square: XY[] = [[0, 0], [400, 0], [400, 300], [0, 300]];

describe("where an area's name goes", () => {
  it("stays in the middle when nothing is drawn there", () => {
    expect(areaLabelSpot(square, "Main roof", [])).toEqual([200, 150]);
    expect(areaLabelSpot(square, "Main roof", [{ x0: 10, y0: 10, x1: 30, y1: 30 }])).toEqual([200, 150]);
  });

  it("moves off an emitter marker in the middle, to a spot clear of it and still inside the area", () => {
    const marker: Rect = { x0: 188, y0: 138, x1: 212, y1: 162 };
    const spot = areaLabelSpot(square, "Main roof", [marker]);
    expect(spot).not.toEqual([200, 150]);
    const box = areaLabelBox(spot, "Main roof");
    expect(rectDistance(box, marker)).toBeGreaterThanOrEqual(12);
    expect(box.x0).toBeGreaterThan(0);
    expect(box.x1).toBeLessThan(400);
    expect(box.y0).toBeGreaterThan(0);
    expect(box.y1).toBeLessThan(300);
  });

  it("keeps clear of another label at the same middle (a penthouse's roof and the penthouse itself)", () => {
    const other = areaLabelBox([200, 150], "Penthouse · 4.2 m");
    const box = areaLabelBox(areaLabelSpot(square, "Penthouse top", [other]), "Penthouse top");
    expect(rectDistance(box, other)).toBeGreaterThan(0);
  });

  it("lets a small outline's name overhang it rather than sit on an access point's name", () => {
    const housing: XY[] = [[0, 0], [40, 0], [40, 40], [0, 40]];
    const door: Rect = { x0: 30, y0: 15, x1: 110, y1: 29 };
    const spot = areaLabelSpot(housing, "Stair housing · 2.6 m", [door], 8, lineLabelBox);
    expect(rectDistance(lineLabelBox(spot, "Stair housing · 2.6 m"), door)).toBeGreaterThan(0);
    expect(spot[0]).toBeGreaterThan(0);
    expect(spot[1]).toBeLessThan(40);
  });
});
