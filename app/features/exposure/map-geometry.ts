// One surface's drawn geometry for the exposure map: the colour-field image, the smoothed 1 %
// outline it is clipped to, the contour lines and the class outlines, in site metres. Pure, so the
// what-if worker builds it beside each result (the main thread then only draws) and the server's
// render builds the same for the loader's result. Kept per AreaView object: a render that shows
// the same result again (an edit's first render, the pending flag) reuses it.
import { SCALE_MIN_PERCENT } from "./colour-scale";
import { classShapes, contourShapes, extendOutside, type ContourShape } from "./contours";
import type { AreaView, FacadeView } from "./exposure-result";
import { fieldImage, type FieldImage } from "./field-image";
import { CONTOUR_PERCENTS } from "./requests";

export type SurfaceGeometry = { field: FieldImage; floor: ContourShape; lines: ContourShape[]; classes: ContourShape[] };
/** A facade's elevation strip in (distance along, height) metres: the image, the 1 % outline, the 100 % line, the class outlines. */
export type FacadeGeometry = { field: FieldImage; floor: ContourShape; hundred: ContourShape; classes: ContourShape[] };

/** Bands, contour lines and class outlines of one surface, in site metres. */
export function surfaceGeometry(a: AreaView): SurfaceGeometry {
  // Loops rather than the mapping forms of from/map: those took half the geometry's time.
  const n = a.classes.length;
  const inside = new Uint8Array(n);
  const plain = new Float64Array(n);
  for (let c = 0; c < n; c++) {
    const k = a.classes[c];
    inside[c] = k !== 255 ? 1 : 0;
    plain[c] = k === 255 ? 0 : k;
  }
  const values = extendOutside(a.percent, inside, a.grid.nx, a.grid.ny);
  const classValues = extendOutside(plain, inside, a.grid.nx, a.grid.ny);
  return {
    field: fieldImage(a.grid, values),
    floor: contourShapes(a.grid, values, [SCALE_MIN_PERCENT])[0],
    lines: contourShapes(a.grid, values, CONTOUR_PERCENTS),
    classes: classShapes(a.grid, classValues),
  };
}

const kept = new WeakMap<AreaView, SurfaceGeometry>();

/** The geometry of an area: the one built beside it (in the worker), else built now and kept. */
export function geometryOf(a: AreaView): SurfaceGeometry {
  let g = kept.get(a);
  if (!g) kept.set(a, (g = surfaceGeometry(a)));
  return g;
}

/** Keeps geometry built elsewhere (the what-if worker's) for its area. */
export function keepGeometry(areas: AreaView[], geometry: SurfaceGeometry[]) {
  areas.forEach((a, k) => geometry[k] && kept.set(a, geometry[k]));
}

/** The grid of a facade's strip: distance along the facade across, height up. */
export function facadeGrid(f: FacadeView) {
  const step = f.along.length > 1 ? f.along[1] - f.along[0] : 1;
  return { nx: f.along.length, ny: f.heights.length, x0: 0, y0: f.heights[0] ?? 0, step };
}

/** A facade strip's colour field, 1 % outline, 100 % line and class outlines (its values as they are: a facade's grid has no outside cells). */
export function facadeGeometry(f: FacadeView): FacadeGeometry {
  const g = facadeGrid(f);
  return {
    field: fieldImage(g, f.percent),
    floor: contourShapes(g, f.percent, [SCALE_MIN_PERCENT])[0],
    hundred: contourShapes(g, f.percent, [100])[0],
    classes: classShapes(g, f.classes),
  };
}

const keptFacades = new WeakMap<FacadeView, FacadeGeometry>();

/** The geometry of a facade: the one built beside it (in the worker), else built now and kept. */
export function facadeGeometryOf(f: FacadeView): FacadeGeometry {
  let g = keptFacades.get(f);
  if (!g) keptFacades.set(f, (g = facadeGeometry(f)));
  return g;
}

/** Keeps facade geometry built elsewhere (the what-if worker's) for its facade. */
export function keepFacadeGeometry(facades: FacadeView[], geometry: FacadeGeometry[]) {
  facades.forEach((f, k) => geometry[k] && keptFacades.set(f, geometry[k]));
}

/** An SVG path of rings (closed), each point through `toPx` and written to 0.1 px: a plain loop, as this runs for every line of every map on each redraw. */
export function ringsPath(rings: [number, number][][], toPx: (x: number, y: number) => [number, number]): string {
  let d = "";
  for (const ring of rings) {
    for (let i = 0; i < ring.length; i++) {
      const [x, y] = toPx(ring[i][0], ring[i][1]);
      d += `${i ? "L" : "M"}${x.toFixed(1)} ${y.toFixed(1)}`;
    }
    d += "Z";
  }
  return d;
}
