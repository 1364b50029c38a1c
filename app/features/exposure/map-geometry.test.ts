// The maps' geometry as the worker builds it: the same shapes as the straightforward formulation
// (the outside cells extended, classes 255 → 0), the facade strip's from its own grid, and paths
// written as before (common practice, no source: SVG path syntax, 0.1 px).
import { describe, expect, it } from "vitest";
import { SCALE_MIN_PERCENT } from "./colour-scale";
import { classShapes, contourShapes, extendOutside } from "./contours";
import type { AreaView, FacadeView } from "./exposure-result";
import { fieldImage } from "./field-image";
import { facadeGeometry, facadeGeometryOf, geometryOf, keepGeometry, ringsPath, surfaceGeometry } from "./map-geometry";
import { CONTOUR_PERCENTS } from "./requests";

const nx = 24;
const ny = 18;
const peak = (i: number, j: number) => 2000 / (1 + (i - 8) ** 2 / 6 + (j - 9) ** 2 / 4);
const inside = (i: number, j: number) => i > 1 && i < 22 && j > 1 && j < 16 && !(i > 15 && j > 10);
const percent: number[] = [];
const classes: number[] = [];
for (let j = 0; j < ny; j++)
  for (let i = 0; i < nx; i++) {
    const v = peak(i, j);
    percent.push(inside(i, j) ? Number(v.toPrecision(3)) : 0);
    classes.push(!inside(i, j) ? 255 : v > 1000 ? 3 : v > 500 ? 2 : v > 100 ? 1 : 0);
  }
const grid = { nx, ny, x0: 2, y0: -1, step: 0.5 };
const area = { surfaceId: "s", name: "Roof", elevationM: 0, polygon: [], grid, percent, classes } as unknown as AreaView;

describe("map geometry", () => {
  it("builds what the plain formulation builds", () => {
    const mask = Uint8Array.from(classes, (c) => (c !== 255 ? 1 : 0));
    const values = extendOutside(percent, mask, nx, ny);
    const classValues = extendOutside(classes.map((c) => (c === 255 ? 0 : c)), mask, nx, ny);
    const g = surfaceGeometry(area);
    expect(g.field).toEqual(fieldImage(grid, values));
    expect(g.floor).toEqual(contourShapes(grid, values, [SCALE_MIN_PERCENT])[0]);
    expect(g.lines).toEqual(contourShapes(grid, values, CONTOUR_PERCENTS));
    expect(g.classes).toEqual(classShapes(grid, classValues));
    expect(g.classes.map((c) => c.value)).toEqual([1, 2, 3]);
    expect(g.lines.find((l) => l.value === 100)!.rings.length).toBeGreaterThan(0);
  });

  it("keeps the geometry built elsewhere for its area", () => {
    const other = { ...area };
    const built = surfaceGeometry(area);
    keepGeometry([other], [built]);
    expect(geometryOf(other)).toBe(built);
    expect(geometryOf(area)).toBe(geometryOf(area));
  });

  it("draws a facade strip on its own grid (distance along × height)", () => {
    const along = Array.from({ length: nx }, (_, i) => i * 0.5);
    const heights = Array.from({ length: ny }, (_, j) => -1 + j * 0.5);
    const facade = { along, heights, percent, classes: classes.map((c) => (c === 255 ? 0 : c)) } as unknown as FacadeView;
    const g = { nx, ny, x0: 0, y0: -1, step: 0.5 };
    expect(facadeGeometry(facade)).toEqual({
      field: fieldImage(g, percent),
      floor: contourShapes(g, percent, [SCALE_MIN_PERCENT])[0],
      hundred: contourShapes(g, percent, [100])[0],
      classes: classShapes(g, facade.classes),
    });
    expect(facadeGeometryOf(facade)).toBe(facadeGeometryOf(facade));
  });

  it("writes paths as the maps did: M/L to 0.1 px, each ring closed", () => {
    const toPx = (x: number, y: number): [number, number] => [x * 10 - 0.04, 100 - y * 10];
    const rings: [number, number][][] = [[[0, 0], [1.234, 0], [1.234, 2.5]], [[3, 3], [4, 3], [4, 4]]];
    const before = rings.map((r) => r.map((p, i) => `${i ? "L" : "M"}${toPx(p[0], p[1]).map((v) => v.toFixed(1)).join(" ")}`).join("") + "Z").join("");
    expect(ringsPath(rings, toPx)).toBe(before);
    expect(ringsPath(rings, toPx)).toBe("M-0.0 100.0L12.3 100.0L12.3 75.0ZM30.0 70.0L40.0 70.0L40.0 60.0Z");
    expect(ringsPath([], toPx)).toBe("");
  });
});
