// Readings set beside the predictions at the same place (pure). A reading in % of a standard keeps
// its %; otherwise its power density is taken against the limit at its frequency, or, for a
// broadband reading, against the lowest limit among the site's frequencies (the conservative
// choice: a broadband probe cannot tell the frequencies apart; common practice, no source).
import { powerDensityLimitWm2, type StandardId, type Tier } from "~/engine/limits";
import type { SourceAssessment, SourceReading } from "./source";

export type ReadingRow = SourceReading & { percent: number | null; predicted: number | null; above: boolean };

export function readingRows(a: Pick<SourceAssessment, "standard" | "tier" | "runs" | "inventory">, readings: SourceReading[]): ReadingRow[] {
  const standard = a.standard as StandardId;
  const tier = a.tier as Tier;
  const limits = a.inventory.emitters.filter((e) => e.active).map((e) => powerDensityLimitWm2(standard, tier, e.frequencyMHz));
  const lowest = limits.length ? Math.min(...limits) : null;
  return readings.map((r) => {
    let percent: number | null = null;
    if (r.unit === "percent" && (!r.percentStandard || r.percentStandard === standard)) percent = r.value;
    else if (r.powerDensityWm2 !== null) {
      const limit = r.frequencyMHz ? powerDensityLimitWm2(standard, tier, r.frequencyMHz) : lowest;
      percent = limit ? (100 * r.powerDensityWm2) / limit : null;
    }
    const predicted = predictionAt(a.runs, r);
    return { ...r, percent, predicted, above: percent !== null && predicted !== null && percent > predicted };
  });
}

/** The value of the grid cell holding (x, y) on the reading's surface, or null off the grids. */
export function predictionAt(runs: SourceAssessment["runs"], r: { surfaceId: string | null; x: number; y: number }): number | null {
  const run = runs.find((x) => x.surfaceId === r.surfaceId && x.response.grid);
  const g = run?.response.grid;
  if (!g) return null;
  const i = Math.round((r.x - g.x0) / g.step);
  const j = Math.round((r.y - g.y0) / g.step);
  if (i < 0 || j < 0 || i >= g.nx || j >= g.ny) return null;
  const k = j * g.nx + i;
  if (g.mask && !g.mask[k]) return null;
  return g.percent[k];
}
