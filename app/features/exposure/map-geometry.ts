// One surface's drawn geometry for the exposure map: the colour-field image, the smoothed 1 %
// outline it is clipped to, the contour lines and the class outlines, in site metres. Pure, so the
// what-if worker builds it beside each result (the main thread then only draws) and the server's
// render builds the same for the loader's result. Kept per AreaView object: a render that shows
// the same result again (an edit's first render, the pending flag) reuses it.
import { SCALE_MIN_PERCENT } from "./colour-scale";
import { classShapes, contourShapes, extendOutside, type ContourShape } from "./contours";
import type { AreaView } from "./exposure-result";
import { fieldImage, type FieldImage } from "./field-image";
import { CONTOUR_PERCENTS } from "./requests";

export type SurfaceGeometry = { field: FieldImage; floor: ContourShape; lines: ContourShape[]; classes: ContourShape[] };

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
