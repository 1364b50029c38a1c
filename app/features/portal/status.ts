// A site's current status for its landlord, read from the frozen assessment behind the latest issued
// document: compliant (within the general-population limit everywhere assessed), or the areas to
// keep people out of, in plain words. Pure; the portal's loaders and the unit tests share it.
// The classes are those of the assessment (47 CFR §1.1307(b)(2)/(b)(4), see exposure/mitigation.ts):
// 0 within the general-population limit, 1 above it but within the occupational limit, 2 above the
// occupational limit up to ten times, 3 beyond that.
import type { SurfaceResult } from "~/features/exposure/evaluate-site";
import type { MitigationPlan } from "~/features/exposure/mitigation";

type XY = [number, number];
export type StatusSource = {
  summary: { worstPercent: number };
  results: { surfaces: Pick<SurfaceResult, "surfaceId" | "name" | "kind" | "worstPercent" | "worstClass" | "areas">[] };
  inventory: { surfaces: { id: string; polygon?: XY[] | null }[] };
  mitigation: Pick<MitigationPlan, "zones" | "signs">;
};

/** Where the status comes from: the assessment behind the latest issued document. */
export type StatusBasis = { assessmentName: string; assessedOn: string; standard: string; documentKind: "report" | "letter" | "certificate"; issuedAt: string | null };
export type KeepOutZone = { areaM2: number; worstClass: number; where: string };
export type KeepOut = { surfaceId: string; name: string; kind: "area" | "facade"; worstClass: number; worstPercent: number; overGeneralM2: number; rule: string; zones: KeepOutZone[] };
export type SiteStatus = {
  compliant: boolean;
  worstPercent: number;
  /** The classes met anywhere (0–3), ascending. */
  classesPresent: number[];
  keepOut: KeepOut[];
  /** Doors, hatches and ladders the plan says to keep locked or supervised. */
  lockedAccess: string[];
};

/** What each class asks of a landlord, in plain words. */
export const classRules = [
  "Open to everyone: within the limit for the public.",
  "Keep the public out: only trained, authorised workers may go in.",
  "Keep everyone out unless the operators have reduced or switched off their transmitters: above the limit for trained workers.",
  "Keep everyone out while the antennas transmit: more than ten times the limit for trained workers.",
];
export const classNames = ["Within the public limit", "Workers only", "No entry without a power-down", "No entry"];

export function siteStatus(a: StatusSource): SiteStatus {
  const present = new Set<number>();
  for (const s of a.results.surfaces) {
    present.add(s.worstClass);
    classAreas(s.areas).forEach((m2, c) => m2 > 0 && present.add(c));
  }
  const keepOut = a.results.surfaces
    .filter((s) => s.worstClass > 0)
    .map((s): KeepOut => {
      const polygon = a.inventory.surfaces.find((x) => x.id === s.surfaceId)?.polygon ?? null;
      // Zones in the same part of the surface read as one place: summed, largest first.
      const byPart = new Map<string, KeepOutZone>();
      for (const z of a.mitigation.zones.filter((x) => x.surfaceId === s.surfaceId)) {
        const where = polygon ? partOf(polygon, z.centre) : "";
        const had = byPart.get(where);
        byPart.set(where, { where, areaM2: (had?.areaM2 ?? 0) + z.areaM2, worstClass: Math.max(had?.worstClass ?? 0, z.worstClass) });
      }
      const zones = [...byPart.values()].sort((x, y) => y.areaM2 - x.areaM2);
      return { surfaceId: s.surfaceId, name: s.name, kind: s.kind, worstClass: s.worstClass, worstPercent: s.worstPercent, overGeneralM2: s.areas.overGeneralM2, rule: classRules[s.worstClass], zones };
    })
    .sort((x, y) => y.worstClass - x.worstClass || y.overGeneralM2 - x.overGeneralM2);
  // An access point's sign says "<name> (<kind>), onto <surfaces>": the name is what a landlord knows it by.
  const lockedAccess = [...new Set(a.mitigation.signs.filter((s) => s.origin === "access-point" && s.category !== "information").map((s) => s.where.split(", onto ")[0].replace(/ \([^()]*\)$/, "")))];
  return {
    compliant: keepOut.length === 0 && a.summary.worstPercent <= 100,
    worstPercent: a.summary.worstPercent,
    classesPresent: [...present].sort((x, y) => x - y),
    keepOut,
    lockedAccess,
  };
}

/** The area of each class alone (the stored areas are cumulative: "over general" includes the classes above it). */
function classAreas(a: SurfaceResult["areas"]): number[] {
  return [a.withinGeneralM2, a.overGeneralM2 - a.overOccupationalM2, a.overOccupationalM2 - a.overTenTimesOccupationalM2, a.overTenTimesOccupationalM2];
}

/** "the north-east part", "the middle", … of a surface: where a point lies in its outline's bounding box, north up. */
export function partOf(polygon: XY[], [x, y]: XY): string {
  const xs = polygon.map((p) => p[0]);
  const ys = polygon.map((p) => p[1]);
  const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const third = (v: number, lo: number, hi: number) => (hi - lo < 1e-9 ? 1 : Math.min(2, Math.max(0, Math.floor((3 * (v - lo)) / (hi - lo)))));
  const ns = ["south", "", "north"][third(y, y0, y1)];
  const ew = ["west", "", "east"][third(x, x0, x1)];
  const dir = ns && ew ? `${ns}-${ew}` : ns || ew;
  return dir ? `the ${dir} part` : "the middle";
}

/** One line for a list: "Compliant" or how many areas to keep out of. */
export function statusLine(s: SiteStatus): string {
  if (s.compliant) return "Compliant: within the public limit everywhere assessed";
  const n = s.keepOut.length;
  return `${n} ${n === 1 ? "area" : "areas"} to keep people out of`;
}
