// Types for isosurface 1.0.0 (CommonJS, no types of its own): the marching-cubes extractor used by
// the 3D view (decision record 0016).
declare module "isosurface" {
  export type Mesh = { positions: number[][]; cells: number[][] };
  /** Polygonises f = 0 over a dims grid; f is sampled at bounds[0] + (bounds[1] − bounds[0])·n/dims (n the node index). Inside is f > 0. */
  export function marchingCubes(dims: [number, number, number], potential: (x: number, y: number, z: number) => number, bounds?: [[number, number, number], [number, number, number]]): Mesh;
  export function surfaceNets(dims: [number, number, number], potential: (x: number, y: number, z: number) => number, bounds?: [[number, number, number], [number, number, number]]): Mesh;
  export function marchingTetrahedra(dims: [number, number, number], potential: (x: number, y: number, z: number) => number, bounds?: [[number, number, number], [number, number, number]]): Mesh;
}
