// Runs a site's exposure: every surface through the engine, then the summaries the tables,
// maps, assessments and documents show. Pure (the engine is pure), so the server and the
// browser's what-if worker give the same numbers.
import { evaluate as engineEvaluate, type EvaluationRequestInput, type EvaluationResponse } from "~/engine";
import type { EnginePattern } from "~/infra/db/schema/emitters";
import { engineEmitters, type InventoryEmitter } from "./engine-inputs";
import { otherTier, type ExposureOptions } from "./options";
import { areaRequest, facadeAxes, facadeRequest, occupationalRequest, otherTierDistancesRequest, worstColumnRequest, type LayoutSurface } from "./requests";

export type Run = { surfaceId: string; request: EvaluationRequestInput; response: EvaluationResponse };
export type SupportingRun = { purpose: "occupational-grid" | "worst-column" | "facade-other-tier" | "distances"; surfaceId: string | null; request: EvaluationRequestInput; response: EvaluationResponse };

/** Exposure classes of 47 CFR §1.1307(b)(2)/(b)(4), against the chosen standard's two limits. */
export const CLASS_NAMES = ["within the general-population limit", "above the general-population limit, within the occupational", "above the occupational limit, up to ten times", "more than ten times the occupational limit"] as const;

export type Areas = { totalM2: number; withinGeneralM2: number; overGeneralM2: number; overOccupationalM2: number; overTenTimesOccupationalM2: number };
export type Contribution = { id: string; percent: number };
export type SurfaceResult = {
  surfaceId: string;
  name: string;
  kind: "area" | "facade";
  elevationM: number | null;
  worstPercent: number;
  worstAt: { x: number; y: number; z: number } | null;
  /** Highest class met anywhere on the surface (0–3). */
  worstClass: number;
  areas: Areas;
  /** Per cell (areas) or point (facades): 0–3 as CLASS_NAMES, 255 outside the outline. */
  classes: number[];
  contributions: Contribution[];
};
export type EmitterSummary = { id: string; label: string; inventoryId: string; eirpW: number; erpW: number; frequencyMHz: number; complianceDistanceM: { general: number; occupational: number } };
export type Summary = {
  worstPercent: number;
  worstAt: { x: number; y: number; z: number; surfaceId: string } | null;
  emitters: { id: string; label: string; eirpW: number; complianceDistanceM: { general: number; occupational: number } }[];
  areas: { surfaceId: string; overGeneralM2: number; overOccupationalM2: number; overTenTimesOccupationalM2: number }[];
};
export type SiteExposure = { runs: Run[]; supporting: SupportingRun[]; surfaces: SurfaceResult[]; emitters: EmitterSummary[]; summary: Summary };
export type SiteInventory = { surfaces: LayoutSurface[]; emitters: InventoryEmitter[]; patterns: ReadonlyMap<string, EnginePattern> };

const usable = (s: LayoutSurface) => (s.kind === "area" ? (s.polygon?.length ?? 0) >= 3 : Boolean(s.line));

export function evaluateSite(inventory: SiteInventory, options: ExposureOptions, evaluate: (r: EvaluationRequestInput) => EvaluationResponse = engineEvaluate): SiteExposure {
  const { emitters, inventoryIdOf } = engineEmitters(inventory.emitters, inventory.patterns, options);
  const runs: Run[] = [];
  const supporting: SupportingRun[] = [];
  const surfaces: SurfaceResult[] = [];
  if (emitters.length === 0) return { runs, supporting, surfaces: [], emitters: [], summary: { worstPercent: 0, worstAt: null, emitters: [], areas: [] } };

  const run = (request: EvaluationRequestInput) => evaluate(request);
  for (const surface of inventory.surfaces.filter(usable)) {
    if (surface.kind === "area") {
      const request = areaRequest(surface, emitters, options);
      const response = run(request);
      runs.push({ surfaceId: surface.id, request, response });
      let occupational: EvaluationResponse | null = null;
      if (response.grid?.classes?.some((c) => c === 2)) {
        const occRequest = occupationalRequest(request);
        occupational = run(occRequest);
        supporting.push({ purpose: "occupational-grid", surfaceId: surface.id, request: occRequest, response: occupational });
      }
      const result = areaResult(surface, response, occupational, options);
      if (result.worstAt) {
        const columnRequest = worstColumnRequest(request, result.worstAt);
        const column = run(columnRequest);
        supporting.push({ purpose: "worst-column", surfaceId: surface.id, request: columnRequest, response: column });
        result.contributions = columnContributions(column, options.mode);
      }
      surfaces.push(result);
    } else {
      const request = facadeRequest(surface, emitters, options);
      const response = run(request);
      runs.push({ surfaceId: surface.id, request, response });
      const otherRequest = { ...request, tier: otherTier(options.tier) };
      const other = run(otherRequest);
      supporting.push({ purpose: "facade-other-tier", surfaceId: surface.id, request: otherRequest, response: other });
      const [general, occupational] = options.tier === "general" ? [response, other] : [other, response];
      surfaces.push(facadeResult(surface, response, general, occupational, options));
    }
  }

  const distances = { general: new Map<string, number>(), occupational: new Map<string, number>() };
  for (const tier of [options.tier, otherTier(options.tier)]) {
    const request = { ...otherTierDistancesRequest(emitters, options), tier };
    const response = run(request);
    supporting.push({ purpose: "distances", surfaceId: null, request, response });
    for (const e of response.emitters) distances[tier].set(e.id, e.complianceDistanceM);
  }
  const first = supporting[supporting.length - 1].response;
  const emitterSummaries: EmitterSummary[] = first.emitters.map((e, i) => ({
    id: e.id,
    label: e.id,
    inventoryId: inventoryIdOf.get(e.id)!,
    eirpW: e.eirpW,
    erpW: e.erpW,
    frequencyMHz: emitters[i].frequencyMHz,
    complianceDistanceM: { general: distances.general.get(e.id)!, occupational: distances.occupational.get(e.id)! },
  }));

  let worst: SurfaceResult | null = null;
  for (const s of surfaces) if (s.worstAt && (!worst || s.worstPercent > worst.worstPercent)) worst = s;
  return {
    runs,
    supporting,
    surfaces,
    emitters: emitterSummaries,
    summary: {
      worstPercent: worst?.worstPercent ?? 0,
      worstAt: worst?.worstAt ? { ...worst.worstAt, surfaceId: worst.surfaceId } : null,
      emitters: emitterSummaries.map((e) => ({ id: e.id, label: e.label, eirpW: e.eirpW, complianceDistanceM: e.complianceDistanceM })),
      areas: surfaces.map((s) => ({ surfaceId: s.surfaceId, overGeneralM2: s.areas.overGeneralM2, overOccupationalM2: s.areas.overOccupationalM2, overTenTimesOccupationalM2: s.areas.overTenTimesOccupationalM2 })),
    },
  };
}

/** Class 0–3 of a cell from the engine's classes (0–2) and, where it is over the occupational limit, the occupational percentage. */
function fourClasses(classes: number[], mask: number[] | undefined, occupationalPercent: number[] | null): number[] {
  return classes.map((c, i) => {
    if (mask && !mask[i]) return 255;
    if (c === 2 && occupationalPercent && occupationalPercent[i] > 1000) return 3;
    return c;
  });
}

function tally(classes: number[], cellM2: number): Areas {
  const n = [0, 0, 0, 0];
  for (const c of classes) if (c !== 255) n[c]++;
  const total = n[0] + n[1] + n[2] + n[3];
  return {
    totalM2: total * cellM2,
    withinGeneralM2: n[0] * cellM2,
    overGeneralM2: (n[1] + n[2] + n[3]) * cellM2,
    overOccupationalM2: (n[2] + n[3]) * cellM2,
    overTenTimesOccupationalM2: n[3] * cellM2,
  };
}

function areaResult(surface: LayoutSurface, response: EvaluationResponse, occupational: EvaluationResponse | null, o: ExposureOptions): SurfaceResult {
  const g = response.grid!;
  const classes = fourClasses(g.classes ?? [], g.mask, occupational?.grid?.percent ?? null);
  return {
    surfaceId: surface.id,
    name: surface.name,
    kind: "area",
    elevationM: surface.elevationM ?? 0,
    worstPercent: g.maxPercent,
    worstAt: g.maxAt ? { ...g.maxAt, z: surface.elevationM ?? 0 } : null,
    worstClass: classes.reduce((m, c) => (c !== 255 && c > m ? c : m), 0),
    areas: tally(classes, o.gridStepM * o.gridStepM),
    classes,
    contributions: [],
  };
}

function facadeResult(surface: LayoutSurface, response: EvaluationResponse, general: EvaluationResponse, occupational: EvaluationResponse, o: ExposureOptions): SurfaceResult {
  const points = response.points ?? [];
  let worst = points[0];
  for (const p of points) if (p.totalPercent > worst.totalPercent) worst = p;
  const occ = occupational.points ?? [];
  const classes = (general.points ?? []).map((p, i): number => (occ[i].totalPercent > 1000 ? 3 : occ[i].totalPercent > 100 ? 2 : p.totalPercent > 100 ? 1 : 0));
  return {
    surfaceId: surface.id,
    name: surface.name,
    kind: "facade",
    elevationM: null,
    worstPercent: worst?.totalPercent ?? 0,
    worstAt: worst ? { x: worst.x, y: worst.y, z: worst.z } : null,
    worstClass: classes.reduce((m, c) => Math.max(m, c), 0),
    areas: tally(classes, facadeAxes(surface, o).step ** 2),
    classes,
    contributions: worst ? [...worst.contributions].sort((a, b) => b.percent - a.percent).map((c) => ({ id: c.id, percent: c.percent })) : [],
  };
}

/** Per-emitter shares at the worst point: averaged over the column of heights, or at its highest height for "max". */
function columnContributions(column: EvaluationResponse, mode: "average" | "max"): Contribution[] {
  const points = column.points ?? [];
  if (!points.length) return [];
  if (mode === "max") {
    const top = points.reduce((a, b) => (b.totalPercent > a.totalPercent ? b : a));
    return [...top.contributions].sort((a, b) => b.percent - a.percent).map((c) => ({ id: c.id, percent: c.percent }));
  }
  const sums = new Map<string, number>();
  for (const p of points) for (const c of p.contributions) sums.set(c.id, (sums.get(c.id) ?? 0) + c.percent);
  return [...sums].map(([id, total]) => ({ id, percent: total / points.length })).sort((a, b) => b.percent - a.percent);
}
