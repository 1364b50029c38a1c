// The engine requests for one site: a grid over each walkable area (its outline as the mask, the
// heights above its elevation), points on a vertical grid for each facade, and the small requests
// that complete the picture (the other tier's classes where needed, contributions at the worst
// point, compliance distances for both tiers).
import type { EmitterInput, EvaluationRequestInput } from "~/engine";
import type { ExposureOptions } from "./options";
import { otherTier } from "./options";

export type XY = [number, number];
export type LayoutSurface = {
  id: string;
  name: string;
  kind: "area" | "facade";
  polygon: XY[] | null;
  line: [XY, XY] | null;
  elevationM: number | null;
  bottomM: number | null;
  topM: number | null;
  access: "public" | "workers" | "none";
};

/** Contour lines drawn on every map, in % of the chosen tier's limit. */
export const CONTOUR_PERCENTS = [5, 20, 50, 100, 500];

/** Facade grids stay readable and bounded: at most this many columns and rows, and no finer than this step (m). */
const FACADE_MAX = 200;
const FACADE_MIN_STEP = 0.5;

const floorTo = (v: number, step: number) => Math.floor(v / step + 1e-9) * step;
const round6 = (v: number) => Math.round(v * 1e6) / 1e6;

function heightsAbove(level: number, o: ExposureOptions) {
  const { fromM, toM, count } = o.heights;
  return count === 1 ? { z0: round6(level + fromM), zCount: 1 } : { z0: round6(level + fromM), z1: round6(level + toM), zCount: count };
}

function base(o: ExposureOptions, emitters: EmitterInput[], tier = o.tier) {
  return { standard: o.standard, tier, emitters };
}

/** A walkable area: a grid aligned to multiples of the step, masked by the outline, classified against both tiers. */
export function areaRequest(surface: LayoutSurface, emitters: EmitterInput[], o: ExposureOptions): EvaluationRequestInput {
  const polygon = surface.polygon ?? [];
  const xs = polygon.map((p) => p[0]);
  const ys = polygon.map((p) => p[1]);
  const step = o.gridStepM;
  return {
    ...base(o, emitters),
    grid: {
      x0: round6(floorTo(Math.min(...xs), step)),
      y0: round6(floorTo(Math.min(...ys), step)),
      x1: Math.max(...xs),
      y1: Math.max(...ys),
      step,
      ...heightsAbove(surface.elevationM ?? 0, o),
      mode: o.mode,
      polygons: [polygon],
      contours: CONTOUR_PERCENTS,
      classify: true,
    },
  };
}

/** The same grid against the occupational limit alone, to find where it is exceeded more than tenfold. */
export function occupationalRequest(area: EvaluationRequestInput): EvaluationRequestInput {
  const { contours: _c, classify: _k, ...grid } = area.grid!;
  return { standard: area.standard, tier: "occupational", emitters: area.emitters, grid };
}

/** Where a facade's points lie: distance along the segment × height. */
export function facadeAxes(surface: LayoutSurface, o: ExposureOptions) {
  const [[ax, ay], [bx, by]] = surface.line!;
  const length = Math.hypot(bx - ax, by - ay);
  const bottom = surface.bottomM ?? 0;
  const top = surface.topM ?? bottom;
  const step = Math.max(o.gridStepM, FACADE_MIN_STEP, length / (FACADE_MAX - 1), (top - bottom) / (FACADE_MAX - 1));
  const along: number[] = [];
  for (let s = 0; s <= length + 1e-9; s += step) along.push(round6(s));
  if (length - along[along.length - 1] > 1e-6) along.push(round6(length));
  const heights: number[] = [];
  for (let z = bottom; z <= top + 1e-9; z += step) heights.push(round6(z));
  if (top - heights[heights.length - 1] > 1e-6) heights.push(round6(top));
  return { along, heights, length, step, ux: length ? (bx - ax) / length : 0, uy: length ? (by - ay) / length : 0, origin: [ax, ay] as XY };
}

/** A facade: the points of its vertical grid, row by row from the bottom, each along the segment. */
export function facadeRequest(surface: LayoutSurface, emitters: EmitterInput[], o: ExposureOptions): EvaluationRequestInput {
  const axes = facadeAxes(surface, o);
  const points = [];
  for (const z of axes.heights) {
    for (const s of axes.along) points.push({ x: round6(axes.origin[0] + axes.ux * s), y: round6(axes.origin[1] + axes.uy * s), z });
  }
  return { ...base(o, emitters), points };
}

/** Contributions at the worst point of an area: the same column of heights, evaluated point by point. */
export function worstColumnRequest(area: EvaluationRequestInput, at: { x: number; y: number }): EvaluationRequestInput {
  const g = area.grid!;
  const zs = g.zCount && g.zCount > 1 ? Array.from({ length: g.zCount }, (_, k) => round6(g.z0! + ((g.z1! - g.z0!) * k) / (g.zCount! - 1))) : [g.z0 ?? 0];
  return { standard: area.standard, tier: area.tier, emitters: area.emitters, points: zs.map((z) => ({ x: at.x, y: at.y, z })) };
}

/** Each emitter's compliance distance against the other tier (the main runs give the chosen tier's). */
export function otherTierDistancesRequest(emitters: EmitterInput[], o: ExposureOptions): EvaluationRequestInput {
  return { ...base(o, emitters, otherTier(o.tier)), points: [{ x: 0, y: 0, z: 0, label: "distances only" }] };
}
