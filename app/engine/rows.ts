/** Grid rows: the per-row driver of the kernel (no dependencies beyond the kernel: shared with worker threads). */
import { reduceHeights, type GridAxes } from "./axes";
import { accumulateRow, rowScratch, type PreparedEmitter } from "./kernel";

/**
 * Fill out[j·nx + i] for rows j0 ≤ j < j1 with the total percent (sum over
 * emitters of each one's fraction of its own limit), reduced over heights.
 */
export function computeGridRows(
  prepared: readonly PreparedEmitter[],
  axes: GridAxes,
  max: boolean,
  j0: number,
  j1: number,
  out: Float64Array,
  mask: Uint8Array | null,
): void {
  const { nx, nz, xs, ys, zs } = axes;
  const acc = new Float64Array(nx * nz);
  const scratch = rowScratch(nz);
  for (let j = j0; j < j1; j++) {
    acc.fill(0);
    const y = ys[j];
    for (let e = 0; e < prepared.length; e++) accumulateRow(prepared[e], xs, y, zs, acc, scratch, mask, j * nx);
    reduceHeights(acc, nx, nz, max, out, j * nx);
    if (mask !== null) for (let i = 0; i < nx; i++) if (mask[j * nx + i] === 0) out[j * nx + i] = 0;
  }
}

/** The whole grid, single-threaded. */
export function computeGrid(prepared: readonly PreparedEmitter[], axes: GridAxes, max: boolean, mask: Uint8Array | null): Float64Array {
  const out = new Float64Array(axes.nx * axes.ny);
  computeGridRows(prepared, axes, max, 0, axes.ny, out, mask);
  return out;
}

