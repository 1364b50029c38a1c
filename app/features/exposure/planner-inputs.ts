// The work-area planner's inputs and outputs around the engine: the request (a grid over the drawn
// polygon at the level it stands on, the heights above that level, the polygon as the work area),
// the emitters after the plan (switched off ones left out, reduced ones with their power factor in
// the duty factor) and the requests of the map after the change. Pure: the page and the tests share it.
import { pointInPolygon, type EmitterInput, type EvaluationRequestInput, type PlanChange, type Tier } from "~/engine";
import type { ExposureOptions } from "./options";
import { areaRequest, type LayoutSurface, type XY } from "./requests";

const round6 = (v: number) => Math.round(v * 1e6) / 1e6;
const floorTo = (v: number, step: number) => Math.floor(v / step + 1e-9) * step;

/** Twice the signed area; a polygon needs three corners and some area to be a work area. */
export function polygonArea(polygon: readonly XY[]): number {
  let a = 0;
  for (let i = 0; i < polygon.length; i++) {
    const [x0, y0] = polygon[i];
    const [x1, y1] = polygon[(i + 1) % polygon.length];
    a += x0 * y1 - x1 * y0;
  }
  return Math.abs(a) / 2;
}

/** The level a work area stands on: of the walkable areas that hold its centre, the highest. */
export function levelUnder(polygon: readonly XY[], surfaces: readonly LayoutSurface[]): LayoutSurface | null {
  if (!polygon.length) return null;
  const cx = polygon.reduce((s, p) => s + p[0], 0) / polygon.length;
  const cy = polygon.reduce((s, p) => s + p[1], 0) / polygon.length;
  const holding = surfaces.filter((s) => s.kind === "area" && s.polygon && s.polygon.length >= 3 && pointInPolygon(cx, cy, s.polygon));
  holding.sort((a, b) => (b.elevationM ?? 0) - (a.elevationM ?? 0));
  return holding[0] ?? null;
}

/**
 * The planner's request: the grid over the polygon's box (aligned to multiples of the step, as the
 * map's), the chosen heights above the level, the polygon as the mask and as the work area, the
 * target 100 % of the chosen tier's limit.
 */
export function plannerRequest(polygon: XY[], elevationM: number, emitters: EmitterInput[], options: ExposureOptions, tier: Tier): EvaluationRequestInput {
  const xs = polygon.map((p) => p[0]);
  const ys = polygon.map((p) => p[1]);
  const step = options.gridStepM;
  const { fromM, toM, count } = options.heights;
  const heights = count === 1 ? { z0: round6(elevationM + fromM), zCount: 1 } : { z0: round6(elevationM + fromM), z1: round6(elevationM + toM), zCount: count };
  return {
    standard: options.standard,
    tier,
    emitters,
    grid: { x0: round6(floorTo(Math.min(...xs), step)), y0: round6(floorTo(Math.min(...ys), step)), x1: Math.max(...xs), y1: Math.max(...ys), step, ...heights, mode: options.mode, polygons: [polygon] },
    workArea: { polygon, tier, targetPercent: 100 },
  };
}

/** The emitters after the plan: switched off ones left out; a reduced one's power factor multiplies its duty factor (time-averaged power scales linearly). */
export function applyPlan(emitters: readonly EmitterInput[], changes: readonly PlanChange[]): EmitterInput[] {
  const byId = new Map(changes.map((c) => [c.id, c]));
  return emitters.flatMap((e) => {
    const c = byId.get(e.id);
    if (!c) return [e];
    if (c.switchOff || c.powerFactor <= 0) return [];
    return [{ ...e, dutyFactor: (e.dutyFactor ?? 1) * c.powerFactor }];
  });
}

/** The requests of the level's map: one per walkable area at that elevation, against the chosen tier. Empty when no emitter is left on air. */
export function levelRequests(surfaces: readonly LayoutSurface[], elevationM: number, emitters: EmitterInput[], options: ExposureOptions, tier: Tier): { surface: LayoutSurface; request: EvaluationRequestInput }[] {
  if (!emitters.length) return [];
  return surfaces
    .filter((s) => s.kind === "area" && s.polygon && s.polygon.length >= 3 && Math.abs((s.elevationM ?? 0) - elevationM) < 1e-6)
    .map((surface) => ({ surface, request: areaRequest(surface, emitters, { ...options, tier }) }));
}

/** "−3.2 dB (48 % of power)", "switch off". */
export function describeChange(c: PlanChange): string {
  if (c.switchOff) return "switch off";
  return `−${c.reductionDb!.toFixed(1)} dB (to ${(c.powerFactor * 100).toFixed(0)} % of power)`;
}
