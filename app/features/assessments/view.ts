// What the assessment pages show, drawn from a stored assessment: per surface its class grid,
// worst point and areas; the emitters with their compliance distances; the plan. Pure.
import type { EmitterSummary, Run, SurfaceResult } from "~/features/exposure/evaluate-site";
import type { MitigationPlan } from "~/features/exposure/mitigation";
import type { ExposureOptions } from "~/features/exposure/options";
import type { XY } from "~/features/layout/plan-frame";

type Stored = {
  id: string;
  siteId: string;
  name: string;
  authorName: string;
  createdAt: Date;
  standard: string;
  tier: string;
  engine: string;
  options: Record<string, unknown>;
  site: Record<string, unknown>;
  inventory: Record<string, unknown>;
  runs: unknown[];
  results: Record<string, unknown>;
  summary: Record<string, unknown>;
  mitigation: Record<string, unknown>;
  mitigationVersion: number;
};
type InvSurface = { id: string; name: string; kind: "area" | "facade"; polygon?: XY[] | null; access: string; elevationM?: number | null };
type InvEmitter = { id: string; label: string; operator: string; band: string; frequencyMHz: number; active: boolean };

export function assessmentView(row: Stored) {
  const runs = row.runs as Run[];
  const results = row.results as { surfaces: SurfaceResult[]; emitters: EmitterSummary[] };
  const inventory = row.inventory as { surfaces: InvSurface[]; emitters: InvEmitter[]; obstructions: { id: string; name: string; polygon: XY[]; baseM: number; heightM: number }[]; accessPoints: { id: string; name: string; kind: string; x: number; y: number; z: number; locked: boolean }[] };
  const summary = row.summary as { worstPercent: number; worstAt: { x: number; y: number; z: number; surfaceId: string } | null };
  const surfaces = results.surfaces.map((r) => {
    const surface = inventory.surfaces.find((s) => s.id === r.surfaceId);
    const g = runs.find((run) => run.surfaceId === r.surfaceId)?.response.grid;
    const elevation = r.elevationM ?? 0;
    return {
      surfaceId: r.surfaceId,
      name: r.name,
      kind: r.kind,
      access: surface?.access ?? "public",
      elevationM: r.elevationM,
      worstPercent: r.worstPercent,
      worstAt: r.worstAt,
      worstClass: r.worstClass,
      areas: r.areas,
      contributions: r.contributions.slice(0, 3),
      map: r.kind === "area" && g && surface?.polygon ? { polygon: surface.polygon, grid: { x0: g.x0, y0: g.y0, step: g.step, nx: g.nx, ny: g.ny }, classes: r.classes } : null,
      obstructions: inventory.obstructions.filter((o) => o.baseM <= elevation + 1e-9 && o.baseM + o.heightM > elevation + 1e-9),
    };
  });
  const emitters = results.emitters.map((e) => {
    const stored = inventory.emitters.find((x) => x.id === e.inventoryId);
    return { id: e.id, inventoryId: e.inventoryId, operator: stored?.operator ?? "", band: stored?.band ?? "", frequencyMHz: e.frequencyMHz, eirpW: e.eirpW, complianceDistanceM: e.complianceDistanceM };
  });
  const siteAndClient = row.site as { site: { name: string; address: string; city: string }; client: { name: string } | null };
  return {
    id: row.id,
    siteId: row.siteId,
    name: row.name,
    authorName: row.authorName,
    createdAt: row.createdAt.toISOString(),
    standard: row.standard,
    tier: row.tier,
    engine: row.engine,
    options: row.options as ExposureOptions,
    siteName: siteAndClient.site.name,
    clientName: siteAndClient.client?.name ?? null,
    summary,
    surfaces,
    emitters,
    inactive: inventory.emitters.filter((e) => !e.active).map((e) => e.label),
    accessPoints: inventory.accessPoints,
    mitigation: row.mitigation as MitigationPlan,
    mitigationVersion: row.mitigationVersion,
  };
}
export type AssessmentView = ReturnType<typeof assessmentView>;
