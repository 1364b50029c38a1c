// The compliance boundary as a solid: the 3D grid's values through marching cubes (isosurface's
// Paul Bourke tables), one triangle soup per tier in site metres. Runs in the 3D view's worker.
import { marchingCubes } from "isosurface";
import { complianceDistanceM, type EmitterInput, type StandardId } from "~/engine";
import { preparedFor } from "./section-field";
import { isoPotential, solidBox, solidField, solidGrid, toSitePositions, type SolidGrid } from "./solid-grid";

export type SolidMeshes = { grid: SolidGrid; general: Float32Array; occupational: Float32Array; maxPercent: { general: number; occupational: number }; computeMs: number };

export function solidMeshes(emitters: EmitterInput[], standard: StandardId, floorM: number, options: { minStep?: number; maxNodes?: number } = {}): SolidMeshes {
  const started = performance.now();
  const prepared = preparedFor(emitters, standard);
  const reach = Math.max(0, ...prepared.general.map((pe) => complianceDistanceM(pe)));
  const grid = solidGrid(solidBox(emitters, reach, floorM), options);
  const field = solidField(emitters, standard, grid);
  const dims: [number, number, number] = [grid.nx, grid.ny, grid.nz];
  const mesh = (values: Float32Array) => {
    const m = marchingCubes(dims, isoPotential(values, grid));
    return toSitePositions(m.positions, m.cells, grid);
  };
  const max = (values: Float32Array) => values.reduce((m, v) => (v > m ? v : m), 0);
  return {
    grid,
    general: mesh(field.general),
    occupational: mesh(field.occupational),
    maxPercent: { general: max(field.general), occupational: max(field.occupational) },
    computeMs: performance.now() - started,
  };
}
