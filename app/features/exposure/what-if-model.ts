// The what-if computation kept fast enough to redraw as the user edits: each walkable area's grid
// is evaluated once per emitter (the spatial average over the heights is linear in each emitter's
// contribution, and so is power), then an edit only re-weights those layers (off: ×0; a power
// change of d dB: ×10^(d/10)) or re-evaluates the one emitter whose azimuth or tilt changed. The
// other tier's values are the same layers times each emitter's ratio of the two limits (the
// density is the same; only the limit differs). Facades get the same treatment, point by point.
// Compliance distances and readings are small and re-run whole. With "maximum over the heights"
// (not linear) every edit re-runs the whole site through `computeExposure`. Pure: the Web Worker
// holds one model per page.
import { evaluate, powerDensityLimitWm2, type EmitterInput } from "~/engine";
import { createEmitterMemo, type EmitterMemo } from "./emitter-memo";
import { engineEmitters } from "./engine-inputs";
import type { Areas, Contribution, EmitterSummary } from "./evaluate-site";
import { computeExposure, emitterViewsOf, lean, type AreaView, type ExposureInput, type ExposureResult, type FacadeView } from "./exposure-result";
import { otherTier } from "./options";
import { compareReadings } from "./readings";
import { areaRequest, facadeAxes, facadeRequest } from "./requests";
import { applyWhatIf, cleanEdits, type WhatIfEdits } from "./what-if";

type Layer = { key: string; percent: Float64Array };
type AreaBase = { surfaceId: string; nx: number; ny: number; x0: number; y0: number; step: number; inside: Uint8Array; cellM2: number; elevationM: number };

export type WhatIfModel = { compute: (edits: WhatIfEdits) => ExposureResult; linear: boolean };

/** `base`: the result for the stored inventory when the caller has it (the page's loader data), else computed here. */
export function createWhatIfModel(input: ExposureInput, baseIn?: ExposureResult): WhatIfModel & { prime: () => void } {
  const o = input.options;
  const linear = o.mode === "average" || o.heights.count === 1;
  if (!linear) return { linear, compute: (edits) => computeExposure(input, edits), prime: () => {} };
  const base = baseIn ?? computeExposure(input);

  const patterns = new Map(input.patterns);
  const areaSurfaces = base.areas.map((a) => input.surfaces.find((s) => s.id === a.surfaceId)!);
  const facadeSurfaces = base.facades.map((f) => input.surfaces.find((s) => s.id === f.surfaceId)!);
  const facadePoints = facadeSurfaces.map((s) => facadeRequest(s, [], o).points!);
  const bases: AreaBase[] = base.areas.map((a) => ({
    surfaceId: a.surfaceId,
    ...a.grid,
    inside: Uint8Array.from(a.classes, (c) => (c === 255 ? 0 : 1)),
    cellM2: a.grid.step * a.grid.step,
    elevationM: a.elevationM,
  }));
  const layers = new Map<string, Layer[]>(); // inventory id → one layer per area surface, then one per facade
  const ratio = new Map<string, number>(); // inventory id → this tier's % to the other tier's %
  const memo = createEmitterMemo(o, input.readings, input.surfaces); // distances and readings, per emitter

  function layersFor(id: string, emitter: EmitterInput): Layer[] {
    const key = JSON.stringify([emitter.azimuthDeg, emitter.tiltDeg]);
    const cached = layers.get(id);
    if (cached && cached[0]?.key === key) return cached;
    // At full stored power: the weights carry the power change.
    const out = areaSurfaces.map((s) => {
      const { contours: _c, classify: _k, ...grid } = areaRequest(s, [emitter], o).grid!;
      const g = evaluate({ standard: o.standard, tier: o.tier, emitters: [emitter], grid }).grid!;
      return { key, percent: Float64Array.from(g.percent) };
    });
    for (const s of facadeSurfaces) {
      const points = evaluate(facadeRequest(s, [emitter], o)).points!;
      out.push({ key, percent: Float64Array.from(points, (p) => p.totalPercent) });
    }
    layers.set(id, out);
    return out;
  }

  return {
    linear,
    /** Evaluates every emitter's layers now (the worker does it while the page is read), so the first edit is quick. */
    prime() {
      const full = engineEmitters(input.emitters, patterns, o);
      for (const em of full.emitters) layersFor(full.inventoryIdOf.get(em.id)!, em);
    },
    compute(editsIn) {
      const edits = cleanEdits(input.emitters, editsIn);
      // Geometry edits only: power changes are weights on the stored-power layers.
      const geometry = applyWhatIf(input.emitters, Object.fromEntries(Object.entries(edits).map(([id, e]) => [id, { azimuthDeg: e.azimuthDeg, tiltDeg: e.tiltDeg }])));
      const full = engineEmitters(geometry, patterns, o);
      const weights: { id: string; engineId: string; weight: number; ratio: number; layers: Layer[] }[] = [];
      for (const em of full.emitters) {
        const id = full.inventoryIdOf.get(em.id)!;
        const edit = edits[id];
        const weight = edit?.off ? 0 : edit?.powerDb !== undefined ? 10 ** (edit.powerDb / 10) : 1;
        if (!ratio.has(id)) ratio.set(id, powerDensityLimitWm2(o.standard, o.tier, em.frequencyMHz) / powerDensityLimitWm2(o.standard, otherTier(o.tier), em.frequencyMHz));
        weights.push({ id, engineId: em.id, weight, ratio: ratio.get(id)!, layers: weight > 0 ? layersFor(id, em) : [] });
      }
      const applied = applyWhatIf(input.emitters, edits);
      const { emitters: engineList, inventoryIdOf } = engineEmitters(applied, patterns, o);
      // Contributions name the emitters as the edited run does (labels made unique among the active ones).
      const engineIdOf = new Map([...inventoryIdOf].map(([engineId, id]) => [id, engineId]));
      const live = weights.filter((w) => w.weight > 0).map((w) => ({ ...w, engineId: engineIdOf.get(w.id) ?? w.engineId }));
      const areas = bases.map((b, k) => areaView(b, base.areas[k], live.map((w) => ({ ...w, layer: w.layers[k].percent })), o.tier));
      const facades = base.facades.map((f, k) => facadeView(f, facadePoints[k], facadeAxes(facadeSurfaces[k], o).step ** 2, live.map((w) => ({ ...w, layer: w.layers[bases.length + k].percent })), o.tier));
      let worst: AreaView | FacadeView | null = null;
      for (const a of [...areas, ...facades]) if (a.worstAt && (!worst || a.worstPercent > worst.worstPercent)) worst = a;
      const compared = compareReadings(input.readings, input.surfaces, memo.readings(engineList), o);
      return {
        areas,
        facades,
        emitters: emitterViewsOf(applied, summaries(engineList, inventoryIdOf, memo), patterns),
        summary: { worstPercent: worst?.worstPercent ?? 0, worstAt: worst?.worstAt ? { ...worst.worstAt, surfaceId: worst.surfaceId, surfaceName: worst.name } : null },
        readings: compared.rows,
        readingsSummary: compared.summary,
        edits,
      };
    },
  };
}

type Weighted = { engineId: string; weight: number; ratio: number; layer: Float64Array };

/** Compliance distances for both tiers and the EIRP, as evaluateSite gets them (kept per emitter: emitter-memo.ts). */
function summaries(engineList: EmitterInput[], inventoryIdOf: Map<string, string>, memo: EmitterMemo): EmitterSummary[] {
  return memo.figures(engineList).map((f, i) => ({
    id: engineList[i].id,
    label: engineList[i].id,
    inventoryId: inventoryIdOf.get(engineList[i].id)!,
    eirpW: f.eirpW,
    erpW: f.erpW,
    frequencyMHz: engineList[i].frequencyMHz,
    complianceDistanceM: { general: f.general, occupational: f.occupational },
  }));
}

/** A facade's points from the weighted layers: the classes and worst point as evaluateSite's facadeResult. */
function facadeView(shape: FacadeView, points: { x: number; y: number; z: number }[], cellM2: number, ws: Weighted[], tier: "general" | "occupational"): FacadeView {
  const n = points.length;
  const total = new Float64Array(n);
  const other = new Float64Array(n);
  for (const w of ws) for (let c = 0; c < n; c++) {
    total[c] += w.weight * w.layer[c];
    other[c] += w.weight * w.ratio * w.layer[c];
  }
  const [gen, occ] = tier === "general" ? [total, other] : [other, total];
  const classes = Array.from(total, (_, c) => (occ[c] > 1000 ? 3 : occ[c] > 100 ? 2 : gen[c] > 100 ? 1 : 0));
  const counts = [0, 0, 0, 0];
  for (const k of classes) counts[k]++;
  let at = n ? 0 : -1;
  for (let c = 1; c < n; c++) if (total[c] > total[at]) at = c;
  return {
    ...shape,
    percent: Array.from(total, lean),
    classes,
    worstPercent: at < 0 ? 0 : Math.round(total[at] * 1e6) / 1e6,
    worstAt: at < 0 ? null : { x: points[at].x, y: points[at].y, z: points[at].z },
    worstClass: counts[3] ? 3 : counts[2] ? 2 : counts[1] ? 1 : 0,
    areas: {
      totalM2: n * cellM2,
      withinGeneralM2: counts[0] * cellM2,
      overGeneralM2: (counts[1] + counts[2] + counts[3]) * cellM2,
      overOccupationalM2: (counts[2] + counts[3]) * cellM2,
      overTenTimesOccupationalM2: counts[3] * cellM2,
    },
    contributions: at < 0 ? [] : ws.map((w) => ({ id: w.engineId, percent: w.weight * w.layer[at] })).sort((p, q) => q.percent - p.percent),
  };
}

function areaView(b: AreaBase, shape: AreaView, ws: Weighted[], tier: "general" | "occupational"): AreaView {
  const n = b.nx * b.ny;
  const total = new Float64Array(n);
  const other = new Float64Array(n);
  for (const w of ws) {
    const { layer, weight } = w;
    const toOther = weight * w.ratio;
    for (let c = 0; c < n; c++) {
      total[c] += weight * layer[c];
      other[c] += toOther * layer[c];
    }
  }
  const [gen, occ] = tier === "general" ? [total, other] : [other, total];
  // Plain arrays filled in order (packed, not holey: several times quicker to fill and to post).
  const classes: number[] = [];
  const percent: number[] = [];
  const counts = [0, 0, 0, 0];
  let max = -1;
  let at = -1;
  for (let c = 0; c < n; c++) {
    if (!b.inside[c]) {
      classes.push(255);
      percent.push(0);
      continue;
    }
    // 47 CFR §1.1307(b)(2)/(b)(4) classes against the standard's two limits, as evaluateSite.
    const k = occ[c] > 1000 ? 3 : occ[c] > 100 ? 2 : gen[c] > 100 ? 1 : 0;
    classes.push(k);
    percent.push(lean(total[c]));
    counts[k]++;
    if (total[c] > max) {
      max = total[c];
      at = c;
    }
  }
  const areas: Areas = {
    totalM2: (counts[0] + counts[1] + counts[2] + counts[3]) * b.cellM2,
    withinGeneralM2: counts[0] * b.cellM2,
    overGeneralM2: (counts[1] + counts[2] + counts[3]) * b.cellM2,
    overOccupationalM2: (counts[2] + counts[3]) * b.cellM2,
    overTenTimesOccupationalM2: counts[3] * b.cellM2,
  };
  const contributions: Contribution[] = at < 0 ? [] : ws.map((w) => ({ id: w.engineId, percent: w.weight * w.layer[at] })).sort((p, q) => q.percent - p.percent);
  const round6 = (v: number) => Math.round(v * 1e6) / 1e6;
  return {
    ...shape,
    percent,
    classes,
    worstPercent: Math.max(0, round6(max)),
    worstAt: at < 0 ? null : { x: round6(b.x0 + (at % b.nx) * b.step), y: round6(b.y0 + Math.floor(at / b.nx) * b.step), z: b.elevationM },
    worstClass: counts[3] ? 3 : counts[2] ? 2 : counts[1] ? 1 : 0,
    areas,
    contributions,
  };
}

