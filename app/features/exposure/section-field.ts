// The elevation view's numbers: total % of each tier's limit at every sample of the cut, from the
// engine (validated request, each emitter's constants hoisted once, then percentAt per point:
// the same function the grids use), and the 100 % boundary of each tier as contour lines.
import { gridContours, parseRequest, percentAt, prepareRequest, type EmitterInput, type GridAxes, type StandardId, type Tier } from "~/engine";
import { samplePoint, type SectionGrid } from "./section-geometry";

export type SectionField = { general: Float64Array; occupational: Float64Array };

/** Validates the emitters with the engine's own schema (same defaults), throwing the engine's message on bad input. */
export function preparedFor(emitters: EmitterInput[], standard: StandardId) {
  const parsed = parseRequest({ standard, tier: "general", emitters, points: [{ x: 0, y: 0, z: 0 }] });
  if (!parsed.ok) throw new Error(parsed.message);
  return { general: prepareRequest(parsed.request, "general").prepared, occupational: prepareRequest(parsed.request, "occupational").prepared };
}

/** Σ over emitters of % of each one's limit at each sample, row k (height) by column i (distance): index k·ns + i. */
export function sectionField(emitters: EmitterInput[], standard: StandardId, g: SectionGrid): SectionField {
  const prepared = preparedFor(emitters, standard);
  const out: SectionField = { general: new Float64Array(g.ns * g.nz), occupational: new Float64Array(g.ns * g.nz) };
  for (const tier of ["general", "occupational"] as const) {
    const values = out[tier];
    for (const pe of prepared[tier]) {
      for (let k = 0; k < g.nz; k++) {
        for (let i = 0; i < g.ns; i++) {
          const [x, y, z] = samplePoint(g, i, k);
          values[k * g.ns + i] += percentAt(pe, x, y, z);
        }
      }
    }
  }
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
