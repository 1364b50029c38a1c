/**
 * evaluate(request) → response: the whole computation, single-threaded and
 * pure. The command line runs the same pieces with grid rows spread over
 * worker threads (scripts/engine-cli.ts) and passes the finished grid in.
 */
import { EngineInputError } from "./errors";
import { fccMpeExemption } from "./exemption";
import { gridAxes, gridMaximum, polygonMask, type GridAxes } from "./axes";
import { classifyCells, gridContours } from "./grid";
import { accumulateRow, percentAt, rowScratch, type PreparedEmitter } from "./kernel";
import { computeGrid } from "./rows";
import type { Tier } from "./limits";
import { planReductions } from "./planner";
import { complianceDistanceM, prepareEmitter, type EmitterSummary } from "./prepare";
import { requestSchema, type EvaluationRequest, type EvaluationResponse } from "./schema";

export const ENGINE_VERSION = "isotrope-engine/1";

export type ParseResult =
  | { ok: true; request: EvaluationRequest }
  | { ok: false; field: string; message: string };

/** Dot/bracket path of a validation issue, e.g. emitters[2].powerW. */
export function fieldPath(path: readonly PropertyKey[]): string {
  let s = "";
  for (const p of path) s += typeof p === "number" ? `[${p}]` : s ? `.${String(p)}` : String(p);
  return s || "(request)";
}

type Issue = { code: string; path: PropertyKey[]; message: string; keys?: string[]; errors?: Issue[][] };

/**
 * The innermost cause of a validation issue, with its absolute path. A union
 * (e.g. a pattern: "isotropic" or an object by `type`) reports the branch that
 * got furthest into the input; branches that failed at the same depth are
 * listed together.
 */
function innermost(issue: Issue, base: PropertyKey[] = []): { path: PropertyKey[]; message: string } {
  const here = [...base, ...issue.path];
  if (issue.code === "invalid_union" && issue.errors?.some((b) => b.length)) {
    const branches = issue.errors.filter((b) => b.length).map((b) => innermost(b[0], here));
    const depth = Math.max(...branches.map((b) => b.path.length));
    const best = branches.filter((b) => b.path.length === depth);
    if (best.length === 1) return best[0];
    return { path: best[0].path, message: best.map((b) => b.message.replace(/^Invalid input: /, "")).join("; or ") };
  }
  // An unknown key is reported on its object; name the key itself.
  if (issue.code === "unrecognized_keys" && issue.keys?.length) return { path: [...here, issue.keys[0]], message: issue.message };
  return { path: here, message: issue.message };
}

/** Validate a request (any JSON value); on failure the first offending field and why. */
export function parseRequest(json: unknown): ParseResult {
  const r = requestSchema.safeParse(json);
  if (r.success) return { ok: true, request: r.data };
  const cause = innermost(r.error.issues[0] as unknown as Issue);
  const field = fieldPath(cause.path);
  return { ok: false, field, message: `${field}: ${cause.message}` };
}

export interface PreparedRequest {
  prepared: PreparedEmitter[];
  summaries: EmitterSummary[];
}

/** Hoist every emitter's constants for a tier (the request's tier by default). */
export function prepareRequest(req: EvaluationRequest, tier: Tier = req.tier): PreparedRequest {
  const prepared: PreparedEmitter[] = [];
  const summaries: EmitterSummary[] = [];
  req.emitters.forEach((e, i) => {
    const r = prepareEmitter(e, req.standard, tier, i);
    prepared.push(r.prepared);
    summaries.push(r.summary);
  });
  return { prepared, summaries };
}

/** The request's grid axes and polygon mask (null without polygons). */
export function requestGrid(req: EvaluationRequest): { axes: GridAxes; mask: Uint8Array | null } | null {
  if (!req.grid) return null;
  const axes = gridAxes(req.grid);
  const mask = req.grid.polygons ? polygonMask(axes, req.grid.polygons) : null;
  return { axes, mask };
}

/** Total and per-emitter contributions at one point. */
export function evaluatePoint(p: PreparedRequest, x: number, y: number, z: number) {
  let total = 0;
  const contributions = p.prepared.map((pe, e) => {
    const percent = percentAt(pe, x, y, z);
    total += percent;
    return { id: pe.id, powerDensityWm2: (percent / 100) * p.summaries[e].limitWm2, percent };
  });
  return { totalPercent: total, contributions };
}

const round6 = (v: number): number => Math.round(v * 1e6) / 1e6;

/** Per-emitter samples inside a polygon (cell-averaged, or per height in max mode) for the planner. */
function workAreaSamples(p: PreparedRequest, axes: GridAxes, max: boolean, mask: Uint8Array): Float64Array[] {
  const { nx, ny, nz, xs, ys, zs } = axes;
  let cells = 0;
  for (let c = 0; c < mask.length; c++) cells += mask[c];
  const per = max ? nz : 1;
  const out = p.prepared.map(() => new Float64Array(cells * per));
  const acc = new Float64Array(nx * nz);
  const scratch = rowScratch(nz);
  p.prepared.forEach((pe, e) => {
    let c = 0;
    for (let j = 0; j < ny; j++) {
      acc.fill(0);
      accumulateRow(pe, xs, ys[j], zs, acc, scratch, mask, j * nx);
      for (let i = 0; i < nx; i++) {
        if (mask[j * nx + i] === 0) continue;
        if (max) for (let k = 0; k < nz; k++) out[e][c * nz + k] = acc[i * nz + k];
        else {
          let s = 0;
          for (let k = 0; k < nz; k++) s += acc[i * nz + k];
          out[e][c] = s / nz;
        }
        c++;
      }
    }
  });
  return out;
}

/**
 * Evaluate a validated request. gridPercent, when given, is the already
 * computed grid for the request's tier (e.g. by worker threads) and is used as is.
 */
export function evaluateParsed(req: EvaluationRequest, gridPercent?: Float64Array): EvaluationResponse {
  const main = prepareRequest(req);
  const response: EvaluationResponse = {
    engine: ENGINE_VERSION,
    standard: req.standard,
    tier: req.tier,
    emitters: main.summaries.map((s, e) => ({
      ...s,
      model: req.emitters[e].model,
      complianceDistanceM: complianceDistanceM(main.prepared[e]),
    })),
  };
  if (req.screening) {
    const d = req.screening.distanceM;
    response.emitters.forEach((em, i) => {
      const e = req.emitters[i];
      // Time-averaged ERP (duty factor applied), as the rule's "maximum time-averaged ERP".
      em.exemption = fccMpeExemption({ frequencyMHz: e.frequencyMHz, erpW: em.erpW * e.dutyFactor, distanceM: d });
    });
  }
  if (req.points) {
    response.points = req.points.map((pt) => ({ ...pt, ...evaluatePoint(main, pt.x, pt.y, pt.z) }));
  }
  const g = requestGrid(req);
  if (g && req.grid) {
    const { axes, mask } = g;
    const max = req.grid.mode === "max";
    const percent = gridPercent ?? computeGrid(main.prepared, axes, max, mask);
    const m = gridMaximum(percent, mask);
    const grid: NonNullable<EvaluationResponse["grid"]> = {
      nx: axes.nx,
      ny: axes.ny,
      nz: axes.nz,
      x0: axes.x0,
      y0: axes.y0,
      step: axes.step,
      heights: Array.from(axes.zs),
      mode: req.grid.mode,
      maxPercent: m.max,
      maxAt: m.index < 0 ? null : { x: axes.xs[m.index % axes.nx], y: axes.ys[Math.floor(m.index / axes.nx)] },
      percent: Array.from(percent, round6),
    };
    if (mask) grid.mask = Array.from(mask);
    if (req.grid.classify) {
      const other: Tier = req.tier === "general" ? "occupational" : "general";
      const otherPercent = computeGrid(prepareRequest(req, other).prepared, axes, max, mask);
      const [gen, occ] = req.tier === "general" ? [percent, otherPercent] : [otherPercent, percent];
      grid.classes = Array.from(classifyCells(gen, occ));
    }
    if (req.grid.contours) grid.contours = gridContours(percent, axes, req.grid.contours);
    response.grid = grid;
    if (req.workArea) {
      const wa = req.workArea;
      const tier = wa.tier ?? req.tier;
      const p = tier === req.tier ? main : prepareRequest(req, tier);
      const waMask = polygonMask(axes, [wa.polygon]);
      if (!waMask.some((v) => v === 1)) throw new EngineInputError("workArea.polygon", "contains no grid cell");
      const samples = workAreaSamples(p, axes, max, waMask);
      const allowed = new Set(wa.adjustable ?? req.emitters.map((e) => e.id));
      const plan = planReductions(
        p.prepared.map((pe) => pe.id),
        samples,
        p.prepared.map((pe) => allowed.has(pe.id)),
        wa.targetPercent,
      );
      response.workArea = { tier, targetPercent: wa.targetPercent, ...plan };
    }
  }
  return response;
}

/** Validate and evaluate; throws EngineInputError naming the field on bad input. */
export function evaluate(request: unknown): EvaluationResponse {
  const r = parseRequest(request);
  if (!r.ok) throw new EngineInputError(r.field, r.message.slice(r.field.length + 2));
  return evaluateParsed(r.request);
}
