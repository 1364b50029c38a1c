// Where an area's name goes on the plan: at its middle unless something else is drawn there
// (an emitter, an access point and its name, another label), then at the spot inside the area
// that keeps the most room around the name. Pure, in SVG pixels. Common practice, no source.
import { pointInPolygon } from "~/engine";
import type { XY } from "./plan-frame";

/** A box in pixels: x0 < x1, y0 < y1 (y down). */
export type Rect = { x0: number; y0: number; x1: number; y1: number };

/** The box an area's two-line label (name, then elevation) fills around its anchor point. */
export function areaLabelBox([x, y]: XY, name: string): Rect {
  // About 6.2 px a character at 11 px; the name's baseline at y, the elevation line 13 px below.
  const half = Math.max(24, name.length * 3.1);
  return { x0: x - half, y0: y - 11, x1: x + half, y1: y + 16 };
}

/** The box of an obstruction's one-line label ("Lift motor room · 3 m", 10 px) around its anchor. */
export function lineLabelBox([x, y]: XY, text: string): Rect {
  const half = Math.max(12, text.length * 2.9);
  return { x0: x - half, y0: y - 9, x1: x + half, y1: y + 3 };
}

export function rectDistance(a: Rect, b: Rect) {
  const dx = Math.max(0, a.x0 - b.x1, b.x0 - a.x1);
  const dy = Math.max(0, a.y0 - b.y1, b.y0 - a.y1);
  return Math.hypot(dx, dy);
}

/** Whether two boxes share more than an edge. */
export const rectsOverlap = (a: Rect, b: Rect) => a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;

const inside = ([x, y]: XY, polygon: readonly XY[]) => pointInPolygon(x, y, polygon);

function vertexMean(points: readonly XY[]): XY {
  const n = points.length || 1;
  return [points.reduce((s, p) => s + p[0], 0) / n, points.reduce((s, p) => s + p[1], 0) / n];
}

/**
 * The anchor of an area's label, in pixels. `polygon` is the area in pixels; `obstacles` are what is
 * drawn already. The middle wins when it is `clearance` px clear of every obstacle; otherwise the
 * candidate on a 9 × 9 grid whose label box lies inside the area (or, failing a clear one, whose
 * anchor does) and is furthest from the obstacles (up to twice the clearance, then the nearest to
 * the middle).
 */
export function areaLabelSpot(polygon: readonly XY[], name: string, obstacles: readonly Rect[], clearance = 12, boxOf: (at: XY, text: string) => Rect = areaLabelBox): XY {
  const middle = vertexMean(polygon);
  const room = (p: XY) => {
    const box = boxOf(p, name);
    return obstacles.reduce((least, o) => Math.min(least, rectDistance(box, o)), Infinity);
  };
  if (polygon.length < 3 || room(middle) >= clearance) return middle;
  const xs = polygon.map((p) => p[0]);
  const ys = polygon.map((p) => p[1]);
  const [minX, maxX, minY, maxY] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  let best: XY = middle;
  let bestScore = Math.min(room(middle), 2 * clearance);
  let bestDistance = 0;
  // First where the whole label fits inside the outline; when nowhere there is clear, where at
  // least its middle is inside (a small plant room's name may overhang its outline).
  for (const whole of [true, false]) {
    for (let i = 1; i < 10; i++) {
      for (let j = 1; j < 10; j++) {
        const p: XY = [minX + ((maxX - minX) * i) / 10, minY + ((maxY - minY) * j) / 10];
        const b = boxOf(p, name);
        const corners: XY[] = [[b.x0, b.y0], [b.x1, b.y0], [b.x0, b.y1], [b.x1, b.y1]];
        if (whole ? !corners.every((c) => inside(c, polygon)) : !inside(p, polygon)) continue;
        const score = Math.min(room(p), 2 * clearance);
        const distance = Math.hypot(p[0] - middle[0], p[1] - middle[1]);
        if (score > bestScore || (score === bestScore && distance < bestDistance)) {
          best = p;
          bestScore = score;
          bestDistance = distance;
        }
      }
    }
    if (bestScore >= clearance) break;
  }
  return best;
}
