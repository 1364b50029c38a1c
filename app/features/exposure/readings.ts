// Field readings against predictions: each reading's point (its surface's elevation plus its
// height), the engine's prediction there, and the ratio measured / predicted. A ratio above 1
// means the prediction is not conservative at that point, which a practitioner must investigate.
// Pure: the loader and the what-if worker share it.
import { powerDensityLimitWm2, type EmitterInput, type EvaluationRequestInput, type EvaluationResponse } from "~/engine";
import type { ExposureOptions } from "./options";
import type { LayoutSurface } from "./requests";

export type SiteReading = {
  id: string;
  label: string;
  visitId: string;
  visitedOn: string;
  surfaceId: string | null;
  x: number;
  y: number;
  heightM: number;
  value: number;
  unit: string;
  frequencyMHz: number | null;
  powerDensityWm2: number | null;
  percentStandard: string | null;
  percentTier: string | null;
};

export type ReadingComparison = {
  id: string;
  label: string;
  visitId: string;
  visitedOn: string;
  x: number;
  y: number;
  z: number;
  heightM: number;
  value: number;
  unit: string;
  /** % of the chosen tier's limit, or null when the reading cannot be put in those terms. */
  measuredPercent: number | null;
  predictedPercent: number;
  /** measured / predicted, null when not comparable; Infinity is never sent (a zero prediction with a reading gives `abovePrediction` and a null ratio). */
  ratio: number | null;
  abovePrediction: boolean;
  /** How the two were compared. */
  basis: "percent" | "power density" | "broadband power density" | "not comparable";
};

export type ReadingsSummary = {
  count: number;
  compared: number;
  above: number;
  worst: { id: string; label: string; ratio: number | null; x: number; y: number; z: number } | null;
};

/** The point of each reading in site metres: its height above its surface's elevation (above the datum when it names none, or a facade). */
export function readingPoints(readings: SiteReading[], surfaces: LayoutSurface[]) {
  const elevation = new Map(surfaces.map((s) => [s.id, s.kind === "area" ? (s.elevationM ?? 0) : 0]));
  return readings.map((r) => ({ x: r.x, y: r.y, z: round6((r.surfaceId ? (elevation.get(r.surfaceId) ?? 0) : 0) + r.heightM), label: r.id }));
}

const round6 = (v: number) => Math.round(v * 1e6) / 1e6;

/** One engine request with every reading's point, or null when there is nothing to predict. */
export function readingsRequest(readings: SiteReading[], surfaces: LayoutSurface[], emitters: EmitterInput[], o: ExposureOptions): EvaluationRequestInput | null {
  if (!readings.length || !emitters.length) return null;
  return { standard: o.standard, tier: o.tier, emitters, points: readingPoints(readings, surfaces) };
}

/** Each reading beside its prediction; `predicted` is the response to `readingsRequest` (null: no emitters, everything predicts 0). */
export function compareReadings(readings: SiteReading[], surfaces: LayoutSurface[], predicted: Pick<EvaluationResponse, "points"> | null, o: ExposureOptions): { rows: ReadingComparison[]; summary: ReadingsSummary } {
  const points = readingPoints(readings, surfaces);
  const rows = readings.map((r, i): ReadingComparison => {
    const p = predicted?.points?.[i];
    const predictedPercent = p?.totalPercent ?? 0;
    const predictedWm2 = p ? p.contributions.reduce((s, c) => s + c.powerDensityWm2, 0) : 0;
    const base = { id: r.id, label: r.label, visitId: r.visitId, visitedOn: r.visitedOn, x: r.x, y: r.y, z: points[i].z, heightM: r.heightM, value: r.value, unit: r.unit, predictedPercent };
    if (r.unit === "percent" && r.percentStandard === o.standard && r.percentTier === o.tier) {
      return { ...base, measuredPercent: r.value, ...ratioOf(r.value, predictedPercent), basis: "percent" };
    }
    if (r.powerDensityWm2 !== null) {
      const ratio = ratioOf(r.powerDensityWm2, predictedWm2);
      if (r.frequencyMHz !== null) {
        const limit = limitOrNull(o, r.frequencyMHz);
        return { ...base, measuredPercent: limit ? (100 * r.powerDensityWm2) / limit : null, ...ratio, basis: "power density" };
      }
      // A broadband reading has no one frequency: in % of the limit it is taken at the predicted
      // mix of frequencies there (measured % = ratio × predicted %), which keeps the ratio exact.
      return { ...base, measuredPercent: ratio.ratio !== null ? ratio.ratio * predictedPercent : null, ...ratio, basis: "broadband power density" };
    }
    return { ...base, measuredPercent: null, ratio: null, abovePrediction: false, basis: "not comparable" };
  });
  return { rows, summary: summarise(rows) };
}

function ratioOf(measured: number, predicted: number) {
  if (predicted > 0) return { ratio: measured / predicted, abovePrediction: measured > predicted };
  return { ratio: null, abovePrediction: measured > 0 };
}

function limitOrNull(o: ExposureOptions, fMHz: number) {
  try {
    return powerDensityLimitWm2(o.standard, o.tier, fMHz);
  } catch {
    return null;
  }
}

function summarise(rows: ReadingComparison[]): ReadingsSummary {
  const compared = rows.filter((r) => r.basis !== "not comparable");
  const above = compared.filter((r) => r.abovePrediction);
  // The worst: a reading with nothing predicted first, then the largest ratio.
  let worst: ReadingComparison | null = null;
  for (const r of compared) {
    if (!worst) worst = r;
    else if (r.abovePrediction && r.ratio === null) worst = worst.ratio === null && worst.abovePrediction ? worst : r;
    else if (!(worst.ratio === null && worst.abovePrediction) && (r.ratio ?? -1) > (worst.ratio ?? -1)) worst = r;
  }
  return {
    count: rows.length,
    compared: compared.length,
    above: above.length,
    worst: worst ? { id: worst.id, label: worst.label, ratio: worst.ratio, x: worst.x, y: worst.y, z: worst.z } : null,
  };
}
