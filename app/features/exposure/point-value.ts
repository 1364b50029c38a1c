// The total and the largest contributors at one point of a surface, for the map's pointer: the
// same column of heights and the same average or maximum as the grid, evaluated by the engine in
// the browser (a few emitters × a few heights: well under a millisecond).
import { evaluate, type EmitterInput } from "~/engine";
import type { ExposureOptions } from "./options";

export type PointValue = { x: number; y: number; totalPercent: number; top: { id: string; percent: number }[] };

export function pointValue(emitters: EmitterInput[], o: ExposureOptions, x: number, y: number, elevationM: number, count = 3): PointValue {
  if (!emitters.length) return { x, y, totalPercent: 0, top: [] };
  const { fromM, toM, count: n } = o.heights;
  const zs = n === 1 ? [elevationM + fromM] : Array.from({ length: n }, (_, k) => elevationM + fromM + ((toM - fromM) * k) / (n - 1));
  const points = evaluate({ standard: o.standard, tier: o.tier, emitters, points: zs.map((z) => ({ x, y, z })) }).points ?? [];
  let column = points;
  if (o.mode === "max") column = [points.reduce((a, b) => (b.totalPercent > a.totalPercent ? b : a))];
  const sums = new Map<string, number>();
  for (const p of column) for (const c of p.contributions) sums.set(c.id, (sums.get(c.id) ?? 0) + c.percent / column.length);
  const all = [...sums].map(([id, percent]) => ({ id, percent })).sort((a, b) => b.percent - a.percent);
  return { x, y, totalPercent: all.reduce((s, c) => s + c.percent, 0), top: all.slice(0, count) };
}
