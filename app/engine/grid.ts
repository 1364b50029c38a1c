/** Tier classification and contour lines of a finished grid. */
import { contours } from "d3-contour";
import type { GridAxes } from "./axes";

/**
 * Cell classes against both tiers: 0 within the general-population limit,
 * 1 above it but within the occupational limit, 2 above the occupational limit.
 */
export function classifyCells(generalPercent: Float64Array, occupationalPercent: Float64Array): Uint8Array {
  const out = new Uint8Array(generalPercent.length);
  for (let c = 0; c < out.length; c++) out[c] = occupationalPercent[c] > 100 ? 2 : generalPercent[c] > 100 ? 1 : 0;
  return out;
}

export interface ContourSet {
  percent: number;
  /** Closed rings in site coordinates (metres), each a list of [x, y]. */
  lines: [number, number][][];
}

/**
 * Contour rings of a percent grid at the given levels (d3-contour's marching
 * squares with linear interpolation). d3 places sample i at pixel i + ½, so
 * x = x0 + (px − ½)·step; rings are clipped to the grid's extent.
 */
export function gridContours(values: Float64Array, axes: GridAxes, levels: readonly number[]): ContourSet[] {
  const gen = contours().size([axes.nx, axes.ny]).smooth(true);
  const xMax = axes.x0 + (axes.nx - 1) * axes.step;
  const yMax = axes.y0 + (axes.ny - 1) * axes.step;
  const vals = Array.from(values);
  return levels.map((level) => {
    const mp = gen.contour(vals, level);
    const lines: [number, number][][] = [];
    for (const polygon of mp.coordinates) {
      for (const ring of polygon) {
        lines.push(
          ring.map(([px, py]) => {
            const x = Math.min(xMax, Math.max(axes.x0, axes.x0 + (px - 0.5) * axes.step));
            const y = Math.min(yMax, Math.max(axes.y0, axes.y0 + (py - 0.5) * axes.step));
            return [x, y] as [number, number];
          }),
        );
      }
    }
    return { percent: level, lines };
  });
}
