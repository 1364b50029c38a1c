// The elevation view's geometry: plane geometry checked by hand (common practice, no source), the
// strongest emitter by EIRP = P·G (FCC OET Bulletin 65, Edition 97-01, eq. (2)).
import { describe, expect, it } from "vitest";
import type { EmitterInput } from "~/engine";
import { boresightCut, emittersNearCut, heightSpan, intervalsInside, levelsInSection, obstructionsInSection, samplePoint, sectionGrid, strongestEmitter } from "./section-geometry";

const e = (id: string, x: number, y: number, z: number, extra: Partial<EmitterInput> = {}): EmitterInput => ({ id, frequencyMHz: 1900, powerW: 10, gainDbi: 10, position: { x, y, z }, ...extra }) as EmitterInput;
const box = { minX: 0, minY: 0, maxX: 40, maxY: 28 };

describe("cut geometry", () => {
  it("runs the default cut from 5 m behind the emitter to where its boresight leaves the site (grown by 5 m)", () => {
    // Azimuth 90° = due east (clockwise from north): from x = 10 − 5 to x = 40 + 5, at y = 10.
    expect(boresightCut(e("A", 10, 10, 3, { azimuthDeg: 90 }), box)).toEqual({ a: [5, 10], b: [45, 10] });
    // Azimuth 0° = north: from y = 5 − 5 to y = 28 + 5.
    expect(boresightCut(e("A", 20, 5, 3, { azimuthDeg: 0 }), box)).toEqual({ a: [20, 0], b: [20, 33] });
    // Azimuth 225° (south-west) from (4, 4): leaves the box grown by 5 m at x = y = −5, 9√2 = 12.73 m ahead; at least 15 m ahead.
    const cut = boresightCut(e("A", 4, 4, 3, { azimuthDeg: 225 }), box);
    expect(Math.hypot(cut.b[0] - 4, cut.b[1] - 4)).toBeCloseTo(15, 2);
  });

  it("finds the stretches of the cut inside a polygon, concave ones in two pieces", () => {
    const square: [number, number][] = [[0, 0], [10, 0], [10, 10], [0, 10]];
    expect(intervalsInside({ a: [-5, 5], b: [15, 5] }, square)).toEqual([[5, 15]]);
    expect(intervalsInside({ a: [2, 5], b: [8, 5] }, square)).toEqual([[0, 6]]); // wholly inside
    expect(intervalsInside({ a: [-5, 20], b: [15, 20] }, square)).toEqual([]); // misses
    // A U shape open to the north: the cut at y = 8 crosses both arms, x ∈ [0, 3] and [7, 10].
    const u: [number, number][] = [[0, 0], [10, 0], [10, 10], [7, 10], [7, 4], [3, 4], [3, 10], [0, 10]];
    expect(intervalsInside({ a: [-1, 8], b: [11, 8] }, u)).toEqual([[1, 4], [8, 11]]);
    // Along a diagonal: the square's diagonal is 10√2 long.
    const [[from, to]] = intervalsInside({ a: [-1, -1], b: [11, 11] }, square);
    expect(to - from).toBeCloseTo(10 * Math.SQRT2, 3);
  });

  it("puts the levels and obstructions the cut crosses at their heights", () => {
    const cut = { a: [-5, 5] as [number, number], b: [45, 5] as [number, number] };
    const levels = levelsInSection(cut, [
      { id: "r", name: "Roof", kind: "area", polygon: [[0, 0], [40, 0], [40, 28], [0, 28]], elevationM: 0, access: "workers" },
      { id: "l", name: "Lower", kind: "area", polygon: [[-18, 2], [0, 2], [0, 18], [-18, 18]], elevationM: -3.5, access: "workers" },
      { id: "f", name: "Wall", kind: "facade", polygon: null, elevationM: null, access: "public" },
    ]);
    expect(levels).toEqual([
      { id: "r", name: "Roof", elevationM: 0, access: "workers", from: 5, to: 45 },
      { id: "l", name: "Lower", elevationM: -3.5, access: "workers", from: 0, to: 5 },
    ]);
    expect(obstructionsInSection(cut, [{ id: "s", name: "Stair", polygon: [[2, 2], [6, 2], [6, 6], [2, 6]], baseM: 0, heightM: 2.6 }])).toEqual([{ id: "s", name: "Stair", baseM: 0, topM: 2.6, from: 7, to: 11 }]);
  });

  it("samples the cut on square cells, within the column and row caps", () => {
    const g = sectionGrid({ a: [0, 0], b: [30, 40] }, -4, 10, { minStep: 0.1, maxCols: 251, maxRows: 200 });
    expect(g.length).toBe(50);
    expect(g.step).toBeCloseTo(0.2, 12); // 50 m over 250 steps; 14 m over 199 rows would allow 0.0704
    expect(g.ns).toBe(251);
    expect(g.nz).toBe(71); // −4 … 10 m every 0.2 m
    const [x, y, z] = samplePoint(g, 250, 70);
    expect(x).toBeCloseTo(30, 9);
    expect(y).toBeCloseTo(40, 9);
    expect(z).toBeCloseTo(10, 9);
  });

  it("lists the emitters near the cut with their distance along it", () => {
    const cut = { a: [0, 0] as [number, number], b: [20, 0] as [number, number] };
    expect(emittersNearCut(cut, [e("on", 5, 0.5, 3), e("far", 5, 4, 3), e("behind", -2, 0, 3)])).toEqual([{ id: "on", s: 5, z: 3, offsetM: 0.5 }]);
  });

  it("spans from a metre below the lowest level to 3 m above the highest top", () => {
    expect(heightSpan([{ elevationM: 0 }, { elevationM: -3.5 }], [6, 4.2])).toEqual([-4.5, 9]);
  });

  it("picks the strongest emitter by time-averaged EIRP = P·10^(−L/10)·10^(G/10)·δ (OET-65 eq. (2))", () => {
    const a = e("A", 0, 0, 0, { powerW: 40, gainDbi: 15 }); // 1264.9 W
    const b = e("B", 0, 0, 0, { powerW: 200, gainDbi: 24.5, dutyFactor: 0.1875 }); // 200·281.8·0.1875 = 10 567 W
    const c = e("C", 0, 0, 0, { powerW: 120, gainDbi: 17.8, lossDb: 1.5 }); // 4262 W
    expect(strongestEmitter([a, b, c])?.id).toBe("B");
    expect(strongestEmitter([a, c])?.id).toBe("C");
    expect(strongestEmitter([])).toBeNull();
  });
});
