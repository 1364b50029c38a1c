// The 3D view's numbers: a box around the antennas, a 3D grid in it, total % of each tier's limit
// at every node (the engine's row kernel, the same one the surface grids use), and what the
// marching-cubes extractor is given: f = log10(% / 100), positive inside the 100 % boundary, zero
// on it. Pure: the worker, the page, the benchmark and the tests share it.
import { accumulateRow, rowScratch, type EmitterInput, type StandardId } from "~/engine";
import { preparedFor } from "./section-field";

export type Box = { minX: number; minY: number; minZ: number; maxX: number; maxY: number; maxZ: number };
export type SolidGrid = { nx: number; ny: number; nz: number; step: number; x0: number; y0: number; z0: number };
/** Values at node (i, j, k) at index i + nx·(j + ny·k): x fastest, then y, then z (the extractor's order). */
export type SolidField = { grid: SolidGrid; general: Float32Array; occupational: Float32Array };

/**
 * The box the boundary can lie in: the antennas grown by `reachM` (the largest compliance distance
 * of the general tier, which holds the occupational one too, capped), never below the lowest level.
 */
export function solidBox(emitters: readonly EmitterInput[], reachM: number, floorM: number, { capM = 30, minM = 2 } = {}): Box {
  const r = Math.min(capM, Math.max(minM, reachM * 1.1 + 0.5));
  const xs = emitters.map((e) => e.position.x);
  const ys = emitters.map((e) => e.position.y);
  const zs = emitters.map((e) => e.position.z);
  return {
    minX: Math.min(...xs) - r,
    minY: Math.min(...ys) - r,
    minZ: Math.max(Math.min(...zs) - r, floorM),
    maxX: Math.max(...xs) + r,
    maxY: Math.max(...ys) + r,
    maxZ: Math.max(...zs) + r,
  };
}

/** A grid over the box with one step both ways, the finest of `minStep` that keeps at most `maxNodes` nodes. */
export function solidGrid(box: Box, { minStep = 0.25, maxNodes = 250_000 } = {}): SolidGrid {
  const volume = (box.maxX - box.minX) * (box.maxY - box.minY) * (box.maxZ - box.minZ);
  let step = Math.max(minStep, Math.cbrt(volume / maxNodes));
  step = Math.ceil(step * 20) / 20; // a round step: multiples of 5 cm
  const count = (lo: number, hi: number) => Math.floor((hi - lo) / step + 1e-9) + 2; // one node past the far side
  return { nx: count(box.minX, box.maxX), ny: count(box.minY, box.maxY), nz: count(box.minZ, box.maxZ), step, x0: box.minX, y0: box.minY, z0: box.minZ };
}

/** Σ over emitters of % of each one's limit at every node, for both tiers. */
export function solidField(emitters: EmitterInput[], standard: StandardId, g: SolidGrid): SolidField {
  const prepared = preparedFor(emitters, standard);
  const xs = Float64Array.from({ length: g.nx }, (_, i) => g.x0 + i * g.step);
  const zs = Float64Array.from({ length: g.nz }, (_, k) => g.z0 + k * g.step);
  const acc = new Float64Array(g.nx * g.nz);
  const scratch = rowScratch(g.nz);
  const out = { grid: g, general: new Float32Array(g.nx * g.ny * g.nz), occupational: new Float32Array(g.nx * g.ny * g.nz) };
  for (let j = 0; j < g.ny; j++) {
    const y = g.y0 + j * g.step;
    prepared.general.forEach((pe, e) => {
      acc.fill(0);
      accumulateRow(pe, xs, y, zs, acc, scratch, null, 0);
      const w = prepared.toOccupational[e];
      // accumulateRow fills acc[i·nz + k]; the extractor wants x fastest.
      for (let k = 0; k < g.nz; k++) {
        for (let i = 0; i < g.nx; i++) {
          const v = acc[i * g.nz + k];
          const at = i + g.nx * (j + g.ny * k);
          out.general[at] += v;
          out.occupational[at] += v * w;
        }
      }
    });
  }
  return out;
}

/**
 * What the marching-cubes extractor samples: f = log10(% / 100) at node (i, j, k), > 0 inside the
 * 100 % boundary. The log keeps the linear interpolation along cell edges close to the true
 * crossing, as power density falls as a power of distance (1/R² far field, 1/R cylindrical).
 * Nodes on the box's faces are forced outside so the surface closes where the box cuts it.
 */
export function isoPotential(values: Float32Array, g: SolidGrid) {
  return (i: number, j: number, k: number): number => {
    if (i <= 0 || j <= 0 || k <= 0 || i >= g.nx - 1 || j >= g.ny - 1 || k >= g.nz - 1) return -1;
    const v = values[i + g.nx * (j + g.ny * k)];
    return v > 0 ? Math.log10(v / 100) : -12;
  };
}

/** Extractor output (node coordinates) to site metres, flattened for a BufferGeometry. */
export function toSitePositions(positions: readonly (readonly number[])[], cells: readonly (readonly number[])[], g: SolidGrid): Float32Array {
  const out = new Float32Array(cells.length * 9);
  let o = 0;
  for (const cell of cells) {
    for (const v of cell) {
      const p = positions[v];
      out[o++] = g.x0 + p[0] * g.step;
      out[o++] = g.y0 + p[1] * g.step;
      out[o++] = g.z0 + p[2] * g.step;
    }
  }
  return out;
}
