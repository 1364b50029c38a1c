/** Grid geometry, polygon masks and height reduction (no dependencies: shared with worker threads). */

/** Grid axis length: x0 + i·step for i = 0… while ≤ x1 (1e-9 slack, as numpy.arange(x0, x1 + 1e-9, step)). */
export const axisCount = (a0: number, a1: number, step: number): number => Math.ceil((a1 - a0 + 1e-9) / step);

export interface GridSpec {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
  step: number;
  z0: number;
  z1?: number;
  zCount: number;
}

export interface GridAxes {
  xs: Float64Array;
  ys: Float64Array;
  zs: Float64Array;
  nx: number;
  ny: number;
  nz: number;
  x0: number;
  y0: number;
  step: number;
}

/**
 * Axes of a grid: x0 + i·step for i = 0… while ≤ x1 (1e-9 slack), likewise y;
 * zCount heights evenly from z0 to z1 (numpy.linspace), or z0 alone.
 */
export function gridAxes(g: GridSpec): GridAxes {
  const nx = axisCount(g.x0, g.x1, g.step);
  const ny = axisCount(g.y0, g.y1, g.step);
  const nz = g.zCount;
  const xs = new Float64Array(nx);
  const ys = new Float64Array(ny);
  const zs = new Float64Array(nz);
  for (let i = 0; i < nx; i++) xs[i] = g.x0 + i * g.step;
  for (let j = 0; j < ny; j++) ys[j] = g.y0 + j * g.step;
  if (nz === 1) zs[0] = g.z0;
  else {
    const z1 = g.z1 as number;
    const dz = (z1 - g.z0) / (nz - 1);
    for (let k = 0; k < nz; k++) zs[k] = g.z0 + k * dz;
    zs[nz - 1] = z1;
  }
  return { xs, ys, zs, nx, ny, nz, x0: g.x0, y0: g.y0, step: g.step };
}

/** Even-odd ray-casting point-in-polygon test (W. R. Franklin's PNPOLY). */
export function pointInPolygon(x: number, y: number, poly: readonly (readonly [number, number])[]): boolean {
  let inside = false;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const xi = poly[i][0];
    const yi = poly[i][1];
    const xj = poly[j][0];
    const yj = poly[j][1];
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

/** Cell mask (index j·nx + i): 1 where the cell centre lies inside any polygon. */
export function polygonMask(axes: GridAxes, polygons: readonly (readonly (readonly [number, number])[])[]): Uint8Array {
  const mask = new Uint8Array(axes.nx * axes.ny);
  for (let j = 0; j < axes.ny; j++) {
    const y = axes.ys[j];
    for (let i = 0; i < axes.nx; i++) {
      const x = axes.xs[i];
      for (const p of polygons) {
        if (pointInPolygon(x, y, p)) {
          mask[j * axes.nx + i] = 1;
          break;
        }
      }
    }
  }
  return mask;
}

/**
 * Reduce nz heights per column (acc[i·nz + k]) into out[offset + i]:
 * the spatial average over the vertical line (arithmetic mean of equally
 * spaced samples, as in IEC 62232 / OET-65 Supplement spatial averaging) or the peak.
 */
export function reduceHeights(acc: Float64Array, nx: number, nz: number, max: boolean, out: Float64Array, offset: number): void {
  const inv = 1 / nz;
  for (let i = 0; i < nx; i++) {
    const base = i * nz;
    if (max) {
      let m = acc[base];
      for (let k = 1; k < nz; k++) if (acc[base + k] > m) m = acc[base + k];
      out[offset + i] = m;
    } else {
      let s = 0;
      for (let k = 0; k < nz; k++) s += acc[base + k];
      out[offset + i] = s * inv;
    }
  }
}

/** The largest value and where (cell index), over unmasked cells; index −1 when none. */
export function gridMaximum(values: Float64Array, mask: Uint8Array | null): { max: number; index: number } {
  let max = 0;
  let index = -1;
  for (let c = 0; c < values.length; c++) {
    if (mask !== null && mask[c] === 0) continue;
    const v = values[c];
    if (index < 0 || v > max) {
      max = v;
      index = c;
    }
  }
  return { max, index };
}

