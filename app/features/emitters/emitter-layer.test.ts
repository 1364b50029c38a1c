// Where the plan prints each emitter's label (common practice, no source: a label never prints over
// another label or the plan's own names, stays inside the plan, and on a phone-sized plan not over
// another emitter's marker either; an emitter without room keeps its marker and its title).
import { describe, expect, it } from "vitest";
import { makeFrame, type PlanFrame } from "~/features/layout/plan-frame";
import { emitterLabelSpots } from "./emitter-layer";

const box = (frame: PlanFrame, e: { x: number; y: number; label: string }, s: { x: number; y: number; anchor: "start" | "end" }) => {
  const [px, py] = frame.toPx(e.x, e.y);
  const w = e.label.length * 6.2;
  return { x0: px + (s.anchor === "end" ? s.x - w : s.x), x1: px + (s.anchor === "end" ? s.x : s.x + w), y0: py + s.y - 9, y1: py + s.y + 3 };
};
const overlap = (a: ReturnType<typeof box>, b: ReturnType<typeof box>) => a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;

describe("emitter labels on the plan", () => {
  const bounds = { minX: 0, minY: 0, maxX: 40, maxY: 30 };

  it("names every emitter of a sparse roof, and stacks those mounted together", () => {
    const frame = makeFrame(bounds, { width: 960 });
    const emitters = [
      { label: "A1", x: 5, y: 5, azimuthDeg: 0 },
      { label: "A2", x: 5, y: 5, azimuthDeg: 0 },
      { label: "B1", x: 30, y: 20, azimuthDeg: 180 },
    ];
    const spots = emitterLabelSpots(frame, emitters);
    expect(spots.every(Boolean)).toBe(true);
    expect(overlap(box(frame, emitters[0], spots[0]!), box(frame, emitters[1], spots[1]!))).toBe(false);
  });

  it("never prints two labels over each other or over the plan's own names, and keeps them inside the plan", () => {
    const frame = makeFrame(bounds, { width: 390 });
    const emitters = Array.from({ length: 12 }, (_, i) => ({ label: `SECTOR-${i}`, x: 18 + (i % 4) * 1.2, y: 12 + Math.floor(i / 4) * 1.2, azimuthDeg: i * 30 }));
    const [cx, cy] = frame.toPx(20, 10);
    const name = { x0: cx - 40, y0: cy - 11, x1: cx + 40, y1: cy + 16 };
    const spots = emitterLabelSpots({ ...frame, labels: [name] }, emitters);
    const placed = spots.flatMap((s, i) => (s ? [box(frame, emitters[i], s)] : []));
    expect(placed.length).toBeGreaterThan(0);
    expect(placed.length).toBeLessThan(emitters.length); // a crowded phone plan leaves some unnamed
    for (const [i, a] of placed.entries()) {
      expect(overlap(a, name)).toBe(false);
      expect(a.x0 >= 0 && a.y0 >= 0 && a.x1 <= frame.width && a.y1 <= frame.height).toBe(true);
      for (const b of placed.slice(i + 1)) expect(overlap(a, b)).toBe(false);
    }
  });

  it("on a phone-sized plan keeps labels off other emitters' markers; on a wide one lets them cross", () => {
    const emitters = [
      { label: "LONG-LABEL-1", x: 10, y: 10, azimuthDeg: 270 },
      { label: "X", x: 11.2, y: 9.4, azimuthDeg: 90 },
    ];
    const onMarker = (frame: PlanFrame) => {
      const s = emitterLabelSpots(frame, emitters)[0];
      if (!s) return null;
      const b = box(frame, emitters[0], s);
      const [mx, my] = frame.toPx(emitters[1].x, emitters[1].y);
      return b.x0 < mx + 9 && mx - 9 < b.x1 && b.y0 < my + 9 && my - 9 < b.y1;
    };
    expect(onMarker(makeFrame(bounds, { width: 390 }))).not.toBe(true);
    expect(onMarker(makeFrame(bounds, { width: 960 }))).toBe(true);
  });
});
