// Barrier lines for the mitigation proposal: the boundary of a class zone (a limit's 100 % contour)
// where it crosses walkable roof, as polylines in site metres. Traced with d3-contour's marching
// squares over the class grid at k − ½, then only the pieces with walkable roof on both sides are
// kept: along a roof edge, a parapet or a plant room wall nobody can walk in, so no barrier.
import { contours } from "d3-contour";
import type { GridGeometry } from "./mitigation-grid";
import type { XY } from "./requests";

const round3 = (v: number) => Math.round(v * 1000) / 1000;

/** Drops points that lie on the straight line between their neighbours. */
function simplify(line: XY[]): XY[] {
  if (line.length < 3) return line;
  const out: XY[] = [line[0]];
  for (let i = 1; i < line.length - 1; i++) {
    const [ax, ay] = out[out.length - 1];
    const [bx, by] = line[i];
    const [cx, cy] = line[i + 1];
    if (Math.abs((bx - ax) * (cy - ay) - (by - ay) * (cx - ax)) > 1e-9) out.push(line[i]);
  }
  out.push(line[line.length - 1]);
  return out;
}

export const polylineLength = (line: XY[]) => line.reduce((s, p, i) => (i ? s + Math.hypot(p[0] - line[i - 1][0], p[1] - line[i - 1][1]) : 0), 0);

/** Polylines (metres) along the edge of the cells of class ≥ minClass, where both sides are walkable. */
export function barrierLines(g: GridGeometry, classes: number[], walkable: Uint8Array, minClass: number): XY[][] {
  const values = classes.map((c, k) => (walkable[k] ? c : 0));
  const shape = contours().size([g.nx, g.ny]).smooth(true).contour(values, minClass - 0.5);
  const walkableAt = (px: number, py: number) => {
    const i = Math.floor(px);
    const j = Math.floor(py);
    return i >= 0 && j >= 0 && i < g.nx && j < g.ny && walkable[j * g.nx + i] === 1;
  };
  const toMetres = ([px, py]: number[]): XY => [round3(g.x0 + (px - 0.5) * g.step), round3(g.y0 + (py - 0.5) * g.step)];
  const lines: XY[][] = [];
  for (const polygon of shape.coordinates) {
    for (const ring of polygon) {
      let current: XY[] = [];
      const flush = () => {
        if (current.length >= 2) lines.push(simplify(current));
        current = [];
      };
      for (let s = 0; s + 1 < ring.length; s++) {
        const [ax, ay] = ring[s];
        const [bx, by] = ring[s + 1];
        const len = Math.hypot(bx - ax, by - ay) || 1;
        const [nx, ny] = [-(by - ay) / len, (bx - ax) / len];
        const [mx, my] = [(ax + bx) / 2, (ay + by) / 2];
        if (walkableAt(mx + 0.5 * nx, my + 0.5 * ny) && walkableAt(mx - 0.5 * nx, my - 0.5 * ny)) {
          if (current.length === 0) current.push(toMetres(ring[s]));
          current.push(toMetres(ring[s + 1]));
        } else flush();
      }
      flush();
    }
  }
  // A ring that was kept whole comes back as one closed line; pieces that meet end to start are joined.
  return joinPieces(lines);
}

function joinPieces(lines: XY[][]): XY[][] {
  const out = [...lines];
  for (let merged = true; merged; ) {
    merged = false;
    for (let a = 0; a < out.length && !merged; a++) {
      for (let b = 0; b < out.length && !merged; b++) {
        if (a === b) continue;
        const end = out[a][out[a].length - 1];
        const start = out[b][0];
        if (end[0] === start[0] && end[1] === start[1]) {
          out[a] = simplify([...out[a], ...out[b].slice(1)]);
          out.splice(b, 1);
          merged = true;
        }
      }
    }
  }
  return out;
}
