// The mitigation proposal drawn from a site's results: signs, barriers and power-down lists that the
// engineer then edits. Pure (the engine is pure). The sign of each exposure class follows the
// categories of 47 CFR §1.1307(b)(2) and (b)(4) (confirmed against the eCFR text, see
// shared REFERENCES.md): within the general-population limit, an optional INFORMATION sign; above
// it but within the occupational limit, NOTICE, with positive access control; above the
// occupational limit by up to ten times, CAUTION; beyond that, WARNING.
//
// Where signs go:
// - at every access point, the sign of the highest class on the surfaces it leads onto (a ladder,
//   hatch or stair within 1 m of an outline leads onto it at any level; a door or gate only at its
//   own level); above class 0 it also needs positive access control (a lock or supervised entry);
// - on walkable surfaces, at each zone of a class (a connected group of cells at or above it), the
//   last cell outside the zone on the shortest walk from each access point onto that surface, so
//   the sign is read before stepping in; a zone no access point reaches gets one on its edge
//   nearest the middle of the surface.
// Barriers follow the general-population and occupational 100 % lines where they cross walkable
// roof (not along roof edges or plant rooms). Surfaces marked "no access" get access-point signs
// and power-down lists only.
import { evaluate as engineEvaluate, type EvaluationRequestInput, type EvaluationResponse } from "~/engine";
import type { SiteExposure, SurfaceResult } from "./evaluate-site";
import { barrierLines, polylineLength } from "./mitigation-barriers";
import { cellCentre, edgeCellNearest, entryCells, leadsTo, nearestWalkable, walkableCells, zonesOf, type AccessPoint, type GridGeometry, type Obstruction } from "./mitigation-grid";
import { powerDownLists, POWER_DOWN_THRESHOLD_PERCENT, zoneShares, type EmitterLimits, type PowerDown } from "./mitigation-power";
import type { ExposureOptions } from "./options";
import type { LayoutSurface, XY } from "./requests";

export const SIGN_CATEGORIES = ["information", "notice", "caution", "warning"] as const;
export type SignCategory = (typeof SIGN_CATEGORIES)[number];
/** The sign each class (0–3) calls for: 47 CFR §1.1307(b)(2)/(b)(4). */
export const signForClass = (cls: number): SignCategory => SIGN_CATEGORIES[Math.max(0, Math.min(3, cls))];
export const signLabels: Record<SignCategory, string> = { information: "INFORMATION (optional)", notice: "NOTICE", caution: "CAUTION", warning: "WARNING" };
export const SIGN_SOURCE = "47 CFR §1.1307(b)(2) and (b)(4)";

export type Sign = { id: string; category: SignCategory; x: number; y: number; z: number; surfaceId: string | null; origin: "access-point" | "boundary" | "engineer"; accessPointId: string | null; where: string; note: string };
export type Barrier = { id: string; surfaceId: string; boundary: "general" | "occupational"; lines: XY[][]; lengthM: number; note: string };
export type Zone = { id: string; surfaceId: string; surfaceName: string; worstClass: number; areaM2: number; centre: XY; powerDown: PowerDown };
export type MitigationPlan = { signs: Sign[]; barriers: Barrier[]; zones: Zone[]; notes: string; basis: { signSource: string; powerDownThresholdPercent: number; accessReachM: number } };

export type MitigationInput = {
  surfaces: { surface: LayoutSurface; result: SurfaceResult; request: EvaluationRequestInput | null; grid: GridGeometry | null }[];
  accessPoints: AccessPoint[];
  obstructions: Obstruction[];
  limits: EmitterLimits[];
  options: Pick<ExposureOptions, "standard" | "tier" | "mode">;
};

const round3 = (v: number) => Math.round(v * 1000) / 1000;
const accessNote = (cls: number, locked: boolean) => (cls === 0 ? "Optional: the site is within the general-population limit beyond this point." : locked ? "Keep locked: positive access control." : "Needs positive access control: fit a lock or supervise entry.");

export function proposeMitigation(input: MitigationInput, evaluate: (r: EvaluationRequestInput) => EvaluationResponse = engineEvaluate): MitigationPlan {
  const signs: Sign[] = [];
  const barriers: Barrier[] = [];
  const zones: Zone[] = [];
  const areas = input.surfaces.filter((s) => s.surface.kind === "area" && s.grid && s.surface.polygon);
  const nextId = (prefix: string, list: unknown[]) => `${prefix}${list.length + 1}`;

  for (const point of input.accessPoints) {
    const onto = areas.filter((s) => leadsTo(point, s.surface.polygon!, s.surface.elevationM ?? 0));
    if (onto.length === 0) continue;
    const cls = Math.max(...onto.map((s) => s.result.worstClass));
    signs.push({ id: nextId("s", signs), category: signForClass(cls), x: point.x, y: point.y, z: point.z, surfaceId: onto.find((s) => s.result.worstClass === cls)!.surface.id, origin: "access-point", accessPointId: point.id, where: `${point.name} (${point.kind}), onto ${onto.map((s) => s.surface.name).join(" and ")}`, note: accessNote(cls, point.locked) });
  }

  for (const { surface, result, request, grid } of areas) {
    const g = grid!;
    const elevation = surface.elevationM ?? 0;
    const walkable = walkableCells(g, result.classes, input.obstructions, elevation);
    const walkedOn = surface.access !== "none";
    const starts = input.accessPoints.filter((p) => leadsTo(p, surface.polygon!, elevation)).map((p) => nearestWalkable(g, walkable, [p.x, p.y]));
    const middle = centreOf(g, walkable);

    for (const minClass of [1, 2, 3]) {
      const { label, count } = zonesOf(g, result.classes, walkable, minClass);
      if (count === 0) continue;
      if (minClass === 1) zones.push(...describeZones(input, g, surface, result, label, count, request, evaluate, zones.length));
      if (!walkedOn) continue;
      const placed = new Set<number>();
      const reached = new Set<number>();
      for (const start of starts) {
        for (const [zone, cell] of entryCells(g, walkable, label, count, start)) {
          reached.add(zone);
          placed.add(cell);
        }
        if (start >= 0 && label[start] !== -1) reached.add(label[start]);
      }
      for (let zone = 0; zone < count; zone++) if (!reached.has(zone)) placed.add(edgeCellNearest(g, walkable, label, zone, middle));
      for (const cell of [...placed].filter((c) => c >= 0).sort((a, b) => a - b)) {
        const [x, y] = cellCentre(g, cell);
        signs.push({ id: nextId("s", signs), category: signForClass(minClass), x: round3(x), y: round3(y), z: elevation, surfaceId: surface.id, origin: "boundary", accessPointId: null, where: `${surface.name}: where the ${signLabels[signForClass(minClass)]} zone begins`, note: "" });
      }
      if (minClass <= 2) {
        const lines = barrierLines(g, result.classes, walkable, minClass);
        if (lines.length) barriers.push({ id: nextId("b", barriers), surfaceId: surface.id, boundary: minClass === 1 ? "general" : "occupational", lines, lengthM: round3(lines.reduce((s, l) => s + polylineLength(l), 0)), note: "" });
      }
    }
  }
  return { signs, barriers, zones, notes: "", basis: { signSource: SIGN_SOURCE, powerDownThresholdPercent: POWER_DOWN_THRESHOLD_PERCENT, accessReachM: 1 } };
}

function centreOf(g: GridGeometry, walkable: Uint8Array): XY {
  let [sx, sy, n] = [0, 0, 0];
  for (let k = 0; k < walkable.length; k++) {
    if (!walkable[k]) continue;
    const [x, y] = cellCentre(g, k);
    [sx, sy, n] = [sx + x, sy + y, n + 1];
  }
  return n ? [sx / n, sy / n] : [g.x0, g.y0];
}

function describeZones(input: MitigationInput, g: GridGeometry, surface: LayoutSurface, result: SurfaceResult, label: Int32Array, count: number, request: EvaluationRequestInput | null, evaluate: (r: EvaluationRequestInput) => EvaluationResponse, offset: number): Zone[] {
  const cells: number[][] = Array.from({ length: count }, () => []);
  for (let k = 0; k < label.length; k++) if (label[k] >= 0) cells[label[k]].push(k);
  const grid = request?.grid;
  const heights = grid ? (grid.zCount && grid.zCount > 1 ? Array.from({ length: grid.zCount }, (_, i) => Math.round((grid.z0! + ((grid.z1! - grid.z0!) * i) / (grid.zCount! - 1)) * 1e6) / 1e6) : [grid.z0 ?? 0]) : [];
  return cells.map((zoneCells, n) => {
    const worstClass = Math.max(...zoneCells.map((k) => result.classes[k]));
    const shares = request && heights.length ? zoneShares(g, zoneCells, { standard: input.options.standard, tier: input.options.tier, emitters: request.emitters, heights, mode: input.options.mode }, evaluate) : new Map<string, number>();
    const centre = zoneCells.reduce<XY>((s, k) => { const [x, y] = cellCentre(g, k); return [s[0] + x / zoneCells.length, s[1] + y / zoneCells.length]; }, [0, 0]);
    return { id: `z${offset + n + 1}`, surfaceId: surface.id, surfaceName: surface.name, worstClass, areaM2: round3(zoneCells.length * g.step * g.step), centre: [round3(centre[0]), round3(centre[1])], powerDown: powerDownLists(shares, input.options.tier, input.limits, worstClass) };
  });
}

/** The proposal's input from a site's evaluation and its layout. */
export function mitigationInput(site: SiteExposure, surfaces: LayoutSurface[], accessPoints: AccessPoint[], obstructions: Obstruction[], options: ExposureOptions): MitigationInput {
  const distances = site.supporting.filter((s) => s.purpose === "distances");
  const limitOf = (tier: string, id: string) => distances.find((d) => d.request.tier === tier)?.response.emitters.find((e) => e.id === id)?.limitWm2 ?? NaN;
  return {
    surfaces: site.surfaces.map((result) => {
      const run = site.runs.find((r) => r.surfaceId === result.surfaceId);
      const g = run?.response.grid;
      return { surface: surfaces.find((s) => s.id === result.surfaceId)!, result, request: run?.request ?? null, grid: g ? { x0: g.x0, y0: g.y0, step: g.step, nx: g.nx, ny: g.ny } : null };
    }),
    accessPoints,
    obstructions,
    limits: site.emitters.map((e) => ({ id: e.id, inventoryId: e.inventoryId, generalWm2: limitOf("general", e.id), occupationalWm2: limitOf("occupational", e.id) })),
    options,
  };
}
