// The map's label placer: labels keep clear of marks and of each other where there is room
// (common practice for map labels, no source).
import { describe, expect, it } from "vitest";
import { around, overlapArea, placeLabels, segmentBoxes } from "./map-labels";

const frame = { width: 400, height: 300 };

describe("placeLabels", () => {
  it("puts a lone label to the right of its point", () => {
    const p = placeLabels([{ key: "a", at: [100, 100], text: "SM-1-850" }], [around([100, 100], 6)], frame).get("a")!;
    expect(p.x).toBeGreaterThan(100);
    expect(p.leader).toBe(false);
  });

  it("gives two emitters at the same mast labels that do not overlap each other or the marks", () => {
    const marks = [around([100, 100], 6), ...segmentBoxes([100, 100], [100, 78]), ...segmentBoxes([100, 100], [120, 100])];
    const placed = placeLabels(
      [
        { key: "a", at: [100, 100], text: "SM-1-850" },
        { key: "b", at: [100, 100], text: "SM-1-2100" },
      ],
      marks,
      frame,
    );
    const [a, b] = [placed.get("a")!, placed.get("b")!];
    expect(overlapArea(a.box, b.box)).toBe(0);
    for (const m of marks) {
      expect(overlapArea(a.box, m)).toBe(0);
      expect(overlapArea(b.box, m)).toBe(0);
    }
  });

  it("stays on the plan near its edge", () => {
    const p = placeLabels([{ key: "a", at: [395, 150], text: "BW-NR-E" }], [], frame).get("a")!;
    expect(p.box[2]).toBeLessThanOrEqual(400);
  });

  it("places every label of a crowded corner somewhere (the least overlapping place when none is free)", () => {
    const requests = Array.from({ length: 12 }, (_, k) => ({ key: String(k), at: [10, 10] as [number, number], text: "ABCDEFGHIJ" }));
    expect(placeLabels(requests, [], { width: 60, height: 40 }).size).toBe(12);
  });
});
