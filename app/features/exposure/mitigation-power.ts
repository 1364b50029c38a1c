// Which emitters to power down for work in a zone: every emitter whose own share reaches the
// threshold (5 % of its limit) anywhere in the zone, for untrained people (the general-population
// limit) and, where the zone is above the occupational limit, for RF-trained workers too.
// The 5 % figure is the FCC's shared-responsibility rule: where the limits are exceeded, every
// transmitter producing more than 5 % of its own limit there shares the duty to bring the area
// into compliance (47 CFR §1.1307(b), from memory; paragraph not confirmed against the eCFR text).
import type { EvaluationRequestInput, EvaluationResponse } from "~/engine";
import { cellCentre, type GridGeometry } from "./mitigation-grid";

export const POWER_DOWN_THRESHOLD_PERCENT = 5;
/** Columns evaluated per zone at most (evenly spread over its cells), to bound the work. */
export const ZONE_SAMPLE_COLUMNS = 600;

export type EmitterLimits = { id: string; inventoryId: string; generalWm2: number; occupationalWm2: number };
export type PowerDownEntry = { id: string; inventoryId: string; maxPercent: number };
export type PowerDown = { general: PowerDownEntry[]; occupational: PowerDownEntry[] };

type Context = { standard: EvaluationRequestInput["standard"]; tier: "general" | "occupational"; emitters: EvaluationRequestInput["emitters"]; heights: number[]; mode: "average" | "max" };

const round6 = (v: number) => Math.round(v * 1e6) / 1e6;

/** Each emitter's largest share (% of the request tier's limit) over the zone's sampled columns. */
export function zoneShares(g: GridGeometry, cells: number[], ctx: Context, evaluate: (r: EvaluationRequestInput) => EvaluationResponse): Map<string, number> {
  const stride = Math.max(1, Math.ceil(cells.length / ZONE_SAMPLE_COLUMNS));
  const sampled = cells.filter((_, n) => n % stride === 0);
  const points = sampled.flatMap((k) => {
    const [x, y] = cellCentre(g, k);
    return ctx.heights.map((z) => ({ x: round6(x), y: round6(y), z }));
  });
  const response = evaluate({ standard: ctx.standard, tier: ctx.tier, emitters: ctx.emitters, points });
  const out = new Map<string, number>();
  const all = response.points ?? [];
  for (let c = 0; c < sampled.length; c++) {
    const column = all.slice(c * ctx.heights.length, (c + 1) * ctx.heights.length);
    const shares = new Map<string, number>();
    if (ctx.mode === "max") {
      const top = column.reduce((a, b) => (b.totalPercent > a.totalPercent ? b : a));
      for (const s of top.contributions) shares.set(s.id, s.percent);
    } else {
      for (const p of column) for (const s of p.contributions) shares.set(s.id, (shares.get(s.id) ?? 0) + s.percent / column.length);
    }
    for (const [id, v] of shares) out.set(id, Math.max(out.get(id) ?? 0, v));
  }
  return out;
}

/** The lists from the shares: each tier's % from the request tier's by the ratio of the two limits. */
export function powerDownLists(shares: Map<string, number>, requestTier: "general" | "occupational", limits: EmitterLimits[], zoneClass: number): PowerDown {
  const list = (tier: "general" | "occupational") =>
    limits
      .map((l) => {
        const share = shares.get(l.id) ?? 0;
        const own = requestTier === "general" ? l.generalWm2 : l.occupationalWm2;
        const target = tier === "general" ? l.generalWm2 : l.occupationalWm2;
        return { id: l.id, inventoryId: l.inventoryId, maxPercent: round6((share * own) / target) };
      })
      .filter((e) => e.maxPercent >= POWER_DOWN_THRESHOLD_PERCENT)
      .sort((a, b) => b.maxPercent - a.maxPercent);
  return { general: list("general"), occupational: zoneClass >= 2 ? list("occupational") : [] };
}
