// Contour geometry of a surface's grid, from d3-contour's marching squares: filled bands for the
// colour scale, lines at set percentages with a place for their labels, and the outlines of the
// exposure classes. Cells outside the surface's outline take their nearest inside neighbour's
// value first, so lines run on to the outline (the map clips them there) instead of bending
// round the grid's edge.
import { contours } from "d3-contour";

export type Ring = [number, number][];
/** One contour: its rings in site metres (outer rings and holes; fill with the even-odd rule). */
export type ContourShape = { value: number; rings: Ring[] };
export type GridGeometry = { nx: number; ny: number; x0: number; y0: number; step: number };

/**
 * Values with the outside cells filled from their inside neighbours, a ring of cells at a time,
 * `passes` times (enough for the edge: marching squares only looks one cell across).
 */
export function extendOutside(values: ArrayLike<number>, inside: ArrayLike<boolean | number>, nx: number, ny: number, passes = 2): Float64Array {
  const out = Float64Array.from(values as ArrayLike<number>);
  let known = new Uint8Array(out.length);
  let all = true;
  for (let c = 0; c < known.length; c++) {
    known[c] = inside[c] ? 1 : 0;
    all &&= known[c] === 1;
  }
  if (all) return out;
  for (let pass = 0; pass < passes; pass++) {
    const next = known.slice();
    for (let j = 0; j < ny; j++) {
      for (let i = 0; i < nx; i++) {
        const c = j * nx + i;
        if (known[c]) continue;
        let best = -Infinity;
        if (i + 1 < nx && known[c + 1]) best = Math.max(best, out[c + 1]);
        if (i > 0 && known[c - 1]) best = Math.max(best, out[c - 1]);
        if (j + 1 < ny && known[c + nx]) best = Math.max(best, out[c + nx]);
        if (j > 0 && known[c - nx]) best = Math.max(best, out[c - nx]);
        if (best > -Infinity) {
          out[c] = best;
          next[c] = 1;
        }
      }
    }
    known = next;
  }
  for (let c = 0; c < out.length; c++) if (!known[c]) out[c] = 0;
  return out;
}

/** d3-contour puts sample i at pixel i + ½: back to site metres, x = x0 + (px − ½)·step (y likewise; y north, as the grid's rows). */
export function toSite(g: GridGeometry, [px, py]: [number, number]): [number, number] {
  return [round3(g.x0 + (px - 0.5) * g.step), round3(g.y0 + (py - 0.5) * g.step)];
}

const round3 = (v: number) => Math.round(v * 1000) / 1000;

/** The areas at or above each threshold, as rings in site metres (d3-contour's isobands, smoothed). */
export function contourShapes(g: GridGeometry, values: ArrayLike<number>, thresholds: number[]): ContourShape[] {
  const gen = contours().size([g.nx, g.ny]).smooth(true);
  // d3-contour reads values by index: a plain or typed array as it is, anything else copied once.
  const list = (Array.isArray(values) || values instanceof Float64Array ? values : Array.from(values)) as number[];
  // A threshold above every value has no area (d3-contour would scan the grid to find none).
  let max = -Infinity;
  for (let c = 0; c < list.length; c++) if (list[c] > max) max = list[c];
  return thresholds.map((value) => {
    if (value > max) return { value, rings: [] };
    const shape = gen.contour(list, value);
    const rings: Ring[] = [];
    for (const polygon of shape.coordinates) for (const ring of polygon) rings.push(ring.map((p) => toSite(g, p as [number, number])));
    return { value, rings };
  });
}

/** Places along a ring, every `spacingM` metres of its length, where a label may go (the map keeps those inside the surface and clear of others). */
export function labelCandidates(ring: Ring, spacingM: number): [number, number][] {
  const out: [number, number][] = [];
  let next = spacingM / 2;
  let walked = 0;
  for (let k = 1; k < ring.length; k++) {
    const [x0, y0] = ring[k - 1];
    const [x1, y1] = ring[k];
    const d = Math.hypot(x1 - x0, y1 - y0);
    while (d > 0 && walked + d >= next) {
      const t = (next - walked) / d;
      out.push([x0 + (x1 - x0) * t, y0 + (y1 - y0) * t]);
      next += spacingM;
    }
    walked += d;
  }
  return out;
}

export function ringLength(ring: Ring): number {
  let sum = 0;
  for (let k = 1; k < ring.length; k++) sum += Math.hypot(ring[k][0] - ring[k - 1][0], ring[k][1] - ring[k - 1][1]);
  return sum;
}

/** Shoelace area (m²): positive for counter-clockwise rings with y north. */
export function signedArea(ring: Ring): number {
  let sum = 0;
  for (let k = 0, n = ring.length; k < n; k++) {
    const [x1, y1] = ring[k];
    const [x2, y2] = ring[(k + 1) % n];
    sum += x1 * y2 - x2 * y1;
  }
  return sum / 2;
}

/** The areas of class ≥ 1, ≥ 2 and ≥ 3 as shapes (outside cells count as class 0). */
export function classShapes(g: GridGeometry, classes: ArrayLike<number>): ContourShape[] {
  // A loop, not Float64Array.from(…, map): the mapping form is several times slower on a large grid.
  const values = new Float64Array(classes.length);
  for (let c = 0; c < values.length; c++) values[c] = classes[c] === 255 ? 0 : classes[c];
  // Thresholds half-way between classes, so the outline runs between cells of different classes.
  return contourShapes(g, values, [0.5, 1.5, 2.5]).map((s, k) => ({ value: k + 1, rings: s.rings }));
}
