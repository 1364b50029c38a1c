// The grid side of the mitigation proposal: which cells people can stand on, the zones of each
// exposure class, the access points that lead onto a surface, and where a person walking in
// from an access point first meets a zone. Pure; cells are row-major (j·nx + i) as the engine's.
import { pointInPolygon } from "~/engine";
import type { XY } from "./requests";

export type GridGeometry = { x0: number; y0: number; step: number; nx: number; ny: number };
export type Obstruction = { polygon: XY[]; baseM: number; heightM: number };
export type AccessPoint = { id: string; name: string; kind: string; x: number; y: number; z: number; locked: boolean };

/** How far (m, in plan) an access point may stand from a surface's outline and still lead onto it. */
export const ACCESS_REACH_M = 1;
/** Doors and gates open onto their own level: within this height (m) of the surface. Ladders, hatches and stairs join levels. */
export const LEVEL_TOLERANCE_M = 0.5;

export const cellCentre = (g: GridGeometry, index: number): XY => [g.x0 + (index % g.nx) * g.step, g.y0 + Math.floor(index / g.nx) * g.step];


/** Plan distance from a point to a polygon (0 inside). */
export function distanceToPolygon(p: XY, polygon: XY[]) {
  if (pointInPolygon(p[0], p[1], polygon)) return 0;
  let best = Infinity;
  for (let i = 0; i < polygon.length; i++) {
    const [ax, ay] = polygon[i];
    const [bx, by] = polygon[(i + 1) % polygon.length];
    const dx = bx - ax;
    const dy = by - ay;
    const t = dx || dy ? Math.max(0, Math.min(1, ((p[0] - ax) * dx + (p[1] - ay) * dy) / (dx * dx + dy * dy))) : 0;
    best = Math.min(best, Math.hypot(p[0] - (ax + t * dx), p[1] - (ay + t * dy)));
  }
  return best;
}

/** Does the access point lead onto this area (at this elevation)? */
export function leadsTo(point: AccessPoint, polygon: XY[], elevationM: number) {
  const joinsLevels = point.kind === "ladder" || point.kind === "hatch" || point.kind === "stair";
  if (!joinsLevels && Math.abs(point.z - elevationM) > LEVEL_TOLERANCE_M) return false;
  return distanceToPolygon([point.x, point.y], polygon) <= ACCESS_REACH_M;
}

/** Cells a person can stand on: inside the outline (class ≠ 255) and not under an obstruction standing on this level. */
export function walkableCells(g: GridGeometry, classes: number[], obstructions: Obstruction[], elevationM: number): Uint8Array {
  const standing = obstructions.filter((o) => o.baseM <= elevationM + 1e-9 && o.baseM + o.heightM > elevationM + 1e-9);
  const out = new Uint8Array(classes.length);
  for (let k = 0; k < classes.length; k++) {
    if (classes[k] === 255) continue;
    const c = cellCentre(g, k);
    out[k] = standing.some((o) => pointInPolygon(c[0], c[1], o.polygon)) ? 0 : 1;
  }
  return out;
}

function neighbours(g: GridGeometry, k: number): number[] {
  const i = k % g.nx;
  const out: number[] = [];
  if (i > 0) out.push(k - 1);
  if (i < g.nx - 1) out.push(k + 1);
  if (k >= g.nx) out.push(k - g.nx);
  if (k + g.nx < g.nx * g.ny) out.push(k + g.nx);
  return out;
}

/** Connected (4-neighbour) groups of usable cells whose class is at least `minClass`; -1 elsewhere. Returns the label per cell and the number of groups. */
export function zonesOf(g: GridGeometry, classes: number[], usable: Uint8Array, minClass: number) {
  const label = new Int32Array(classes.length).fill(-1);
  let count = 0;
  for (let s = 0; s < classes.length; s++) {
    if (label[s] !== -1 || !usable[s] || classes[s] === 255 || classes[s] < minClass) continue;
    const stack = [s];
    label[s] = count;
    while (stack.length) {
      const k = stack.pop()!;
      for (const n of neighbours(g, k)) {
        if (label[n] === -1 && usable[n] && classes[n] !== 255 && classes[n] >= minClass) {
          label[n] = count;
          stack.push(n);
        }
      }
    }
    count++;
  }
  return { label, count };
}

/** The walkable cell nearest a plan point, or -1. */
export function nearestWalkable(g: GridGeometry, walkable: Uint8Array, p: XY) {
  let best = -1;
  let bestD = Infinity;
  for (let k = 0; k < walkable.length; k++) {
    if (!walkable[k]) continue;
    const [x, y] = cellCentre(g, k);
    const d = (x - p[0]) ** 2 + (y - p[1]) ** 2;
    if (d < bestD) [best, bestD] = [k, d];
  }
  return best;
}

/**
 * Walking in from `start` over walkable cells (breadth first, 4 neighbours): for each zone, the
 * last cell outside it on the shortest walk to it (where a sign stands so that it is read before
 * stepping in). Zones the start lies in, or cannot reach, get none.
 */
export function entryCells(g: GridGeometry, walkable: Uint8Array, zoneLabel: Int32Array, zoneCount: number, start: number): Map<number, number> {
  const entries = new Map<number, number>();
  if (start < 0 || zoneLabel[start] !== -1) return entries;
  const seen = new Uint8Array(walkable.length);
  seen[start] = 1;
  const queue = [start];
  for (let head = 0; head < queue.length && entries.size < zoneCount; head++) {
    const k = queue[head];
    for (const n of neighbours(g, k)) {
      if (seen[n] || !walkable[n]) continue;
      seen[n] = 1;
      if (zoneLabel[n] !== -1) {
        if (!entries.has(zoneLabel[n])) entries.set(zoneLabel[n], k);
        continue; // walk around zones, not through them
      }
      queue.push(n);
    }
  }
  return entries;
}

/** For a zone no access point reaches: its outside neighbour (walkable, not in the zone) nearest the point given. */
export function edgeCellNearest(g: GridGeometry, walkable: Uint8Array, zoneLabel: Int32Array, zone: number, p: XY) {
  let best = -1;
  let bestD = Infinity;
  for (let k = 0; k < zoneLabel.length; k++) {
    if (zoneLabel[k] !== zone) continue;
    for (const n of neighbours(g, k)) {
      if (!walkable[n] || zoneLabel[n] === zone) continue;
      const [x, y] = cellCentre(g, n);
      const d = (x - p[0]) ** 2 + (y - p[1]) ** 2;
      if (d < bestD) [best, bestD] = [n, d];
    }
  }
  return best;
}
