// The report's section 3 (method, models and assumptions) as plain lines, so the report PDF and a
// filing's method.md say exactly the same thing.
import { CLASS_NAMES } from "~/features/exposure/evaluate-site";
import { describeHeights } from "~/features/exposure/options";
import { METHOD_SOURCES, standardText } from "./common.server";
import type { SourceAssessment } from "./source";

export type MethodAssessment = Pick<SourceAssessment, "standard" | "tier" | "options" | "runs" | "engine">;

/** The method's statements: standard and tier, the limit tables, the models, heights and grid, the factors, units, classes and the engine. */
export function methodLines(a: MethodAssessment): string[] {
  const o = a.options;
  const limitSources = [...new Set(a.runs.flatMap((r) => r.response.emitters.map((e) => e.limit.source)))];
  return [
    `Standard and tier: ${standardText(a)}. Limits by frequency: ${limitSources.join("; ")}.`,
    `Power density is summed over all emitters as fractions of each one's limit at its own frequency (Σ S_i / S_limit,i ≤ 1), shown as total % of the limit.`,
    `Model: ${o.defaultModel} unless an emitter names its own; far field S = P·G/(4πR²) with a power reflection factor of ${o.reflectionFactor}${o.reflectionFactor === 2.56 ? " (OET-65's ground reflection)" : ""}.`,
    `Heights: ${describeHeights(o)}; grid of ${o.gridStepM} m over each walkable surface.`,
    `Time averaging through each emitter's duty factor and actual-maximum power factor (IEC 62232); both are 1 unless the operator supplied a value.`,
    "Units: power density in W/m² (1 mW/cm² = 10 W/m², 1 µW/cm² = 0.01 W/m²); fields in V/m and A/m, related through η0 ≈ 376.73 Ω; angles in degrees (°); areas in m².",
    "A place is within a limit at ≤ 100 % of it and over it above 100 %; any class ≥ 1 needs positive access control. Readings are set beside predictions as read, without adding the probe's own uncertainty (often ± 1 to 3 dB).",
    `Exposure classes: ${CLASS_NAMES.map((c, i) => `${i}: ${c}`).join("; ")}.`,
    `Computed by ${a.engine}. Each run's request and response are kept with the assessment and re-run to the same bytes.`,
  ];
}

export { METHOD_SOURCES };
