// Readings set beside the predictions, compared the way the Exposure page compares them
// (features/exposure/readings.ts, `readingsOf`): each reading against the engine's prediction at the
// reading's own point and height (its surface's elevation plus its height above it), from the frozen
// assessment's own engine emitters. Not against the grid cell's value, which is a spatial average
// over 0–2 m (or a maximum over the heights) and says nothing of one height in a beam. Pure.
import { evaluate, type EmitterInput } from "~/engine";
import { compareReadings, readingsRequest, type ReadingComparison, type SiteReading } from "~/features/exposure/readings";
import type { LayoutSurface } from "~/features/exposure/requests";
import type { SourceAssessment, SourceReading } from "./source";

export type ReadingRow = SourceReading & { percent: number | null; predicted: number; above: boolean; basis: ReadingComparison["basis"] };

/** The engine emitters the assessment ran with (each run names them; the same emitter in several runs once). */
export function frozenEmitters(runs: SourceAssessment["runs"]): EmitterInput[] {
  const byId = new Map<string, EmitterInput>();
  for (const run of runs) for (const e of (run.request.emitters ?? []) as EmitterInput[]) if (!byId.has(e.id)) byId.set(e.id, e);
  return [...byId.values()];
}

export function readingRows(a: Pick<SourceAssessment, "options" | "runs" | "inventory">, readings: SourceReading[]): ReadingRow[] {
  if (readings.length === 0) return [];
  const surfaces: LayoutSurface[] = a.inventory.surfaces.map((s) => ({ id: s.id, name: s.name, kind: s.kind, polygon: s.polygon ?? null, line: null, elevationM: s.elevationM ?? null, bottomM: null, topM: null, access: s.access as LayoutSurface["access"] }));
  const site: SiteReading[] = readings.map((r) => ({ id: r.id, label: r.label, visitId: r.visitId, visitedOn: r.visitedOn, surfaceId: r.surfaceId, x: r.x, y: r.y, heightM: r.heightM, value: r.value, unit: r.unit, frequencyMHz: r.frequencyMHz, powerDensityWm2: r.powerDensityWm2, percentStandard: r.percentStandard, percentTier: r.percentTier }));
  const request = readingsRequest(site, surfaces, frozenEmitters(a.runs), a.options);
  const { rows } = compareReadings(site, surfaces, request ? evaluate(request) : null, a.options);
  return readings.map((r, i) => ({ ...r, percent: rows[i].measuredPercent, predicted: rows[i].predictedPercent, above: rows[i].abovePrediction, basis: rows[i].basis }));
}
