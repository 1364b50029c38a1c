// Contour assembly from d3-contour on a surface grid, in site metres.
import { contours } from "d3-contour";
import { describe, expect, it } from "vitest";
import { classShapes, contourShapes, extendOutside, labelCandidates, ringLength, signedArea, toSite } from "./contours";

const g = { nx: 41, ny: 41, x0: -5, y0: -5, step: 0.25 };
/** A cone: 200 % at the centre (0, 0), falling by 20 % per metre. */
const cone = Array.from({ length: g.nx * g.ny }, (_, c) => {
  const x = g.x0 + (c % g.nx) * g.step;
  const y = g.y0 + Math.floor(c / g.nx) * g.step;
  return 200 - 20 * Math.hypot(x, y);
});

describe("contours", () => {
  it("maps d3's pixel coordinates back to site metres (sample i at pixel i + ½)", () => {
    expect(toSite(g, [0.5, 0.5])).toEqual([-5, -5]);
    expect(toSite(g, [20.5, 40.5])).toEqual([0, 5]);
  });

  it("finds the 100 % line of the cone as a circle of radius 5 m (200 − 20r = 100), within a cell", () => {
    const [shape] = contourShapes(g, cone, [100]);
    expect(shape.rings).toHaveLength(1);
    const [ring] = shape.rings;
    for (const [x, y] of ring) expect(Math.abs(Math.hypot(x, y) - 5)).toBeLessThan(0.25);
    // Area πr² within 2 %; the polygon's length within 5 % of 2πr (marching squares' segments wander by up to a cell).
    expect(Math.abs(signedArea(ring)) / (Math.PI * 25)).toBeCloseTo(1, 1);
    expect(Math.abs(ringLength(ring) / (2 * Math.PI * 5) - 1)).toBeLessThan(0.05);
  });

  it("gives no rings above the grid's highest value, as d3-contour does", () => {
    const shapes = contourShapes(g, cone, [150, 200.001, 5000]);
    expect(shapes.map((s) => s.rings.length)).toEqual([1, 0, 0]);
    expect(contours().size([g.nx, g.ny]).smooth(true).contour(cone, 200.001).coordinates).toEqual([]);
  });

  it("offers label places evenly along a ring", () => {
    const square: [number, number][] = [[0, 0], [4, 0], [4, 4], [0, 4], [0, 0]];
    expect(labelCandidates(square, 4)).toEqual([[2, 0], [4, 2], [2, 4], [0, 2]]);
    expect(labelCandidates(square, 100)).toEqual([]);
  });

  it("fills cells outside the outline from their inside neighbours, so lines reach the edge", () => {
    // 3 × 1 grid: only the middle cell is inside.
    expect(Array.from(extendOutside([0, 50, 0], [0, 1, 0], 3, 1))).toEqual([50, 50, 50]);
    // Beyond the passes, outside cells are 0.
    expect(Array.from(extendOutside([0, 0, 0, 80], [0, 0, 0, 1], 4, 1, 2))).toEqual([0, 80, 80, 80]);
  });

  it("outlines the class areas: a block of class-2 cells inside class-1 and class-0 cells", () => {
    const geo = { nx: 8, ny: 8, x0: 0, y0: 0, step: 1 };
    const classes = Array.from({ length: 64 }, (_, c) => {
      const i = c % 8, j = Math.floor(c / 8);
      if (i === 0) return 255;
      return i >= 3 && i <= 5 && j >= 3 && j <= 5 ? 2 : i >= 2 && i <= 6 && j >= 2 && j <= 6 ? 1 : 0;
    });
    const [one, two, three] = classShapes(geo, classes);
    expect(three.rings).toEqual([]);
    expect(two.rings).toHaveLength(1);
    // Class ≥ 2: cells 3…5 in each direction, outlined half-way to their neighbours: 3 m × 3 m, less
    // the four corners marching squares cuts (triangles of legs ½ m: ⅛ m² each), 9 − 0.5 = 8.5 m².
    expect(Math.abs(signedArea(two.rings[0]))).toBeCloseTo(8.5, 6);
    expect(Math.abs(signedArea(one.rings[0]))).toBeCloseTo(24.5, 6);
  });
});
