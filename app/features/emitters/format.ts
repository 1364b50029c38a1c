// How the Emitters section writes its numbers: three significant figures for powers, units beside.
const sig = (v: number, n = 3) => (v === 0 ? "0" : Math.abs(v) >= 10 ** n ? Math.round(v).toLocaleString("en-GB") : String(Number(v.toPrecision(n))));

/** A power in W, as W or kW. */
export function formatWatts(w: number) {
  if (!Number.isFinite(w)) return "—";
  return w >= 1000 ? `${sig(w / 1000)} kW` : `${sig(w)} W`;
}

export const formatNumber = (v: number | null | undefined, unit = "") => (v === null || v === undefined || !Number.isFinite(v) ? "—" : `${String(Number(v.toPrecision(6)))}${unit}`);
