// The elevation view's numbers: total % of each tier's limit at every sample of the cut, from the
// engine (validated request, each emitter's constants hoisted once, then percentAt per point:
// the same function the grids use), and the 100 % boundary of each tier as contour lines.
import { accumulateRow, gridContours, parseRequest, powerDensityLimitWm2, prepareRequest, rowScratch, type EmitterInput, type GridAxes, type StandardId, type Tier } from "~/engine";
import type { SectionGrid } from "./section-geometry";

export type SectionField = { general: Float64Array; occupational: Float64Array };

/**
 * Validates the emitters with the engine's own schema (same defaults), throwing the engine's
 * message on bad input, and hoists their constants against the general-population limits, with
 * each emitter's factor to the occupational ones. % of a limit is 100·S/S_lim and S does not
 * depend on the tier, so % occupational = % general × S_lim,general / S_lim,occupational: one
 * evaluation per point serves both tiers.
 */
export function preparedFor(emitters: EmitterInput[], standard: StandardId) {
  const parsed = parseRequest({ standard, tier: "general", emitters, points: [{ x: 0, y: 0, z: 0 }] });
  if (!parsed.ok) throw new Error(parsed.message);
  const general = prepareRequest(parsed.request, "general");
  return {
    general: general.prepared,
    toOccupational: parsed.request.emitters.map((e, i) => general.summaries[i].limitWm2 / powerDensityLimitWm2(standard, "occupational", e.frequencyMHz)),
  };
}

/**
 * The emitters seen from the cut: a rotation about the vertical through the cut's start A that
 * turns the cut onto the +x axis, so each sample (s, z) is the point (s, 0, z). A rotation keeps
 * every distance and every angle off boresight, so the values are the same; it lets the engine's
 * row kernel (all heights of a row at once) do the work. Positions: x′ = Δ·u, y′ = Δ·u⊥
 * (u the cut's unit vector); bearings: az′ = az + 90° − β, β the cut's bearing.
 */
export function emittersInCutFrame(emitters: readonly EmitterInput[], g: Pick<SectionGrid, "a" | "ux" | "uy">): EmitterInput[] {
  const beta = (Math.atan2(g.ux, g.uy) * 180) / Math.PI;
  return emitters.map((e) => {
    const dx = e.position.x - g.a[0];
    const dy = e.position.y - g.a[1];
    const az = ((((e.azimuthDeg ?? 0) + 90 - beta) % 360) + 360) % 360;
    return { ...e, position: { x: dx * g.ux + dy * g.uy, y: -dx * g.uy + dy * g.ux, z: e.position.z }, azimuthDeg: az };
  });
}

/** Σ over emitters of % of each one's limit at each sample, row k (height) by column i (distance): index k·ns + i. */
export function sectionField(emitters: EmitterInput[], standard: StandardId, g: SectionGrid): SectionField {
  const prepared = preparedFor(emittersInCutFrame(emitters, g), standard);
  const xs = Float64Array.from({ length: g.ns }, (_, i) => i * g.step);
  const zs = Float64Array.from({ length: g.nz }, (_, k) => g.z0 + k * g.step);
  const acc = new Float64Array(g.ns * g.nz);
  const scratch = rowScratch(g.nz);
  const out: SectionField = { general: new Float64Array(g.ns * g.nz), occupational: new Float64Array(g.ns * g.nz) };
  prepared.general.forEach((pe, e) => {
    acc.fill(0);
    accumulateRow(pe, xs, 0, zs, acc, scratch, null, 0);
    const w = prepared.toOccupational[e];
    for (let i = 0; i < g.ns; i++) {
      for (let k = 0; k < g.nz; k++) {
        const v = acc[i * g.nz + k];
        out.general[k * g.ns + i] += v;
        out.occupational[k * g.ns + i] += v * w;
      }
    }
  });
  return out;
}

/** The section's grid as the engine's contour helper reads it: x = distance along the cut, y = height. */
export function sectionAxes(g: SectionGrid): GridAxes {
  const xs = Float64Array.from({ length: g.ns }, (_, i) => i * g.step);
  const ys = Float64Array.from({ length: g.nz }, (_, k) => g.z0 + k * g.step);
  return { xs, ys, zs: new Float64Array([0]), nx: g.ns, ny: g.nz, nz: 1, x0: 0, y0: g.z0, step: g.step };
}

/** The 100 % line of each tier, in (distance, height), with the tier it belongs to. */
export function boundaryLines(field: SectionField, g: SectionGrid): { tier: Tier; lines: [number, number][][] }[] {
  const axes = sectionAxes(g);
  return (["general", "occupational"] as const).map((tier) => ({ tier, lines: gridContours(field[tier], axes, [100])[0].lines }));
}

/** The largest value of a tier over the section and where it is. */
export function sectionMaximum(values: Float64Array, g: SectionGrid) {
  let best = 0;
  for (let c = 1; c < values.length; c++) if (values[c] > values[best]) best = c;
  return { percent: values[best] ?? 0, s: (best % g.ns) * g.step, z: g.z0 + Math.floor(best / g.ns) * g.step };
}
