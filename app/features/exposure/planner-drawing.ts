// Drawing a polygon on a plan by clicking its corners: snapped to a step, closed by clicking near
// the first corner (or by the Close button). Pure steps plus a small hook, so any plan (the work-
// area planner, later the main map) can reuse it with SitePlan's onSiteClick and draft.
import { useCallback, useState } from "react";
import type { XY } from "./requests";

export type Drawing = { points: XY[]; closed: boolean };

const snapTo = (v: number, step: number) => Number((Math.round(v / step) * step).toFixed(6));

/** The drawing after a click at `p`: a new corner (snapped), or closed when the click lands within `closeM` of the first corner and there are three corners. A closed drawing starts again. */
export function addCorner(d: Drawing, p: XY, { step = 0.25, closeM = 0.75 } = {}): Drawing {
  const q: XY = [snapTo(p[0], step), snapTo(p[1], step)];
  if (d.closed) return { points: [q], closed: false };
  const first = d.points[0];
  if (first && d.points.length >= 3 && Math.hypot(p[0] - first[0], p[1] - first[1]) <= closeM) return { points: d.points, closed: true };
  const last = d.points[d.points.length - 1];
  if (last && last[0] === q[0] && last[1] === q[1]) return d; // a double click adds nothing
  return { points: [...d.points, q], closed: false };
}

export function usePolygonDrawing(options?: { step?: number; closeM?: number }) {
  const [drawing, setDrawing] = useState<Drawing>({ points: [], closed: false });
  const add = useCallback((p: XY) => setDrawing((d) => addCorner(d, p, options)), [options]);
  const undo = useCallback(() => setDrawing((d) => ({ points: d.closed ? d.points : d.points.slice(0, -1), closed: false })), []);
  const close = useCallback(() => setDrawing((d) => (d.points.length >= 3 ? { ...d, closed: true } : d)), []);
  const clear = useCallback(() => setDrawing({ points: [], closed: false }), []);
  return { drawing, add, undo, close, clear, set: setDrawing };
}
