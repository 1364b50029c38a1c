// The what-if's small engine runs kept per emitter: each emitter's compliance distances (both
// tiers), EIRP and ERP, and its share at the readings' points. The engine works these out emitter
// by emitter (an emitter's summary and its percentAt do not depend on the others), so one emitter
// per request gives the same numbers as one request with them all, and an off or power edit
// re-runs only the emitter it changes instead of validating and preparing every pattern again.
// The readings' totals are the emitters' shares added in the list's order from zero, as the
// engine's evaluatePoint adds them, so they are the same bits. Pure; the worker keeps one per model.
import { EngineInputError, evaluate, type EmitterInput, type EvaluationResponse } from "~/engine";
import { otherTier, type ExposureOptions } from "./options";
import { readingsRequest, type SiteReading } from "./readings";
import { otherTierDistancesRequest, type LayoutSurface } from "./requests";

type Figures = { eirpW: number; erpW: number; general: number; occupational: number };
type Shares = NonNullable<EvaluationResponse["points"]>[number]["contributions"][number][];
type Point = NonNullable<EvaluationResponse["points"]>[number];

export type EmitterMemo = {
  /** Each emitter's EIRP, ERP and compliance distance for both tiers, as one request per tier over the list gives them. */
  figures: (list: EmitterInput[]) => Figures[];
  /** The engine's answer at the readings' points for the list (only `points`), or null when there is nothing to predict. */
  readings: (list: EmitterInput[]) => Pick<EvaluationResponse, "points"> | null;
};

/** Cache keys: the emitter as JSON, a pattern object by identity (a library or own pattern is the same object from edit to edit). */
function keyer() {
  const ids = new WeakMap<object, number>();
  let next = 0;
  const replacer = (key: string, value: unknown) => {
    if (key !== "pattern" || typeof value !== "object" || value === null) return value;
    let id = ids.get(value);
    if (id === undefined) ids.set(value, (id = ++next));
    return `#${id}`;
  };
  return (e: EmitterInput) => JSON.stringify(e, replacer);
}

export function createEmitterMemo(o: ExposureOptions, readings: SiteReading[], surfaces: LayoutSurface[], limit = 256): EmitterMemo {
  const key = keyer();
  const figures = new Map<string, Figures>();
  const shares = new Map<string, Shares>();
  const keep = <V>(map: Map<string, V>, k: string, v: V) => {
    if (map.size >= limit) map.delete(map.keys().next().value!);
    map.set(k, v);
    return v;
  };
  const figuresOf = (e: EmitterInput): Figures => {
    const k = key(e);
    const hit = figures.get(k);
    if (hit) return hit;
    const mine = evaluate({ ...otherTierDistancesRequest([e], o), tier: o.tier }).emitters[0];
    const other = evaluate({ ...otherTierDistancesRequest([e], o), tier: otherTier(o.tier) }).emitters[0];
    const byTier = o.tier === "general" ? { general: mine, occupational: other } : { general: other, occupational: mine };
    return keep(figures, k, { eirpW: other.eirpW, erpW: other.erpW, general: byTier.general.complianceDistanceM, occupational: byTier.occupational.complianceDistanceM });
  };
  let points: Omit<Point, "totalPercent" | "contributions">[] | null = null;
  const sharesOf = (e: EmitterInput): Shares => {
    const k = key(e);
    const hit = shares.get(k);
    if (hit) return hit;
    const answer = evaluate(readingsRequest(readings, surfaces, [e], o)!).points!;
    points ??= answer.map(({ totalPercent: _t, contributions: _c, ...p }) => p);
    return keep(shares, k, answer.map((p) => p.contributions[0]));
  };
  // One emitter per request names it emitters[0]; an error names its place in the list instead.
  const at = <V>(run: (e: EmitterInput) => V) => (e: EmitterInput, index: number): V => {
    try {
      return run(e);
    } catch (error) {
      if (!(error instanceof EngineInputError)) throw error;
      const field = error.field.replace(/^emitters\[0\]/, `emitters[${index}]`);
      throw new EngineInputError(field, error.message.slice(error.field.length + 2));
    }
  };
  return {
    figures: (list) => list.map(at(figuresOf)),
    readings(list) {
      if (!readingsRequest(readings, surfaces, list, o)) return null;
      const each = list.map(at(sharesOf));
      return {
        points: points!.map((p, i) => {
          let totalPercent = 0;
          const contributions = each.map((s) => {
            totalPercent += s[i].percent;
            return s[i];
          });
          return { ...p, totalPercent, contributions };
        }),
      };
    },
  };
}
