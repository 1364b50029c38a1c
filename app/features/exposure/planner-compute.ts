// Runs the work-area planner and the level's map before and after the plan with the engine, in the
// browser. Plain data in and out.
import { evaluate, type EmitterInput, type Tier } from "~/engine";
import type { ExposureOptions } from "./options";
import { applyPlan, levelRequests, plannerRequest } from "./planner-inputs";
import type { LayoutSurface, XY } from "./requests";

export type LevelMap = { surfaceId: string; nx: number; ny: number; x0: number; y0: number; step: number; percent: number[]; mask: number[] | null; contour100: [number, number][][] };

function levelMaps(surfaces: LayoutSurface[], elevationM: number, emitters: EmitterInput[], options: ExposureOptions, tier: Tier): LevelMap[] {
  return levelRequests(surfaces, elevationM, emitters, options, tier).map(({ surface, request }) => {
    const g = evaluate({ ...request, grid: { ...request.grid!, contours: [100], classify: false } }).grid!;
    return { surfaceId: surface.id, nx: g.nx, ny: g.ny, x0: g.x0, y0: g.y0, step: g.step, percent: g.percent, mask: g.mask ?? null, contour100: g.contours?.[0]?.lines ?? [] };
  });
}

export function runPlanner(polygon: XY[], level: LayoutSurface, surfaces: LayoutSurface[], emitters: EmitterInput[], options: ExposureOptions, tier: Tier) {
  const started = performance.now();
  const elevationM = level.elevationM ?? 0;
  const response = evaluate(plannerRequest(polygon, elevationM, emitters, options, tier));
  const plan = response.workArea!;
  const after = applyPlan(emitters, plan.changes);
  return {
    plan,
    cellsInArea: response.grid!.mask?.reduce((s, v) => s + v, 0) ?? 0,
    before: levelMaps(surfaces, elevationM, emitters, options, tier),
    after: levelMaps(surfaces, elevationM, after, options, tier),
    ms: performance.now() - started,
  };
}
