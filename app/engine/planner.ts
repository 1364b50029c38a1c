/**
 * Work-area planner: which emitters to reduce or switch off, and by how much,
 * so that the maximum over a work area is at most the target (100 % of a
 * tier's limit). Totals are linear in each emitter's power factor sₑ:
 * T(c) = Σₑ sₑ·Cₑ(c) (sum of fractions, spatially averaged or per height), so a
 * greedy rule is used: while the worst sample exceeds the target, take the
 * adjustable emitter contributing most there and scale it down just enough
 * (or switch it off when even that is not enough). Not an optimum in general,
 * but every step is exact and the result is verified.
 */

export interface PlanChange {
  id: string;
  powerFactor: number;
  reductionDb: number | null;
  switchOff: boolean;
}

export interface PlanResult {
  maxPercentBefore: number;
  maxPercentAfter: number;
  feasible: boolean;
  changes: PlanChange[];
}

/**
 * contributions[e][c]: percent of emitter e at sample c (any sample layout).
 * adjustable[e]: whether the plan may change emitter e.
 */
export function planReductions(
  ids: readonly string[],
  contributions: readonly Float64Array[],
  adjustable: readonly boolean[],
  targetPercent = 100,
): PlanResult {
  const ne = ids.length;
  const n = ne ? contributions[0].length : 0;
  const total = new Float64Array(n);
  for (let e = 0; e < ne; e++) {
    const c = contributions[e];
    for (let i = 0; i < n; i++) total[i] += c[i];
  }
  const worst = (): number => {
    let w = -1;
    let m = -Infinity;
    for (let i = 0; i < n; i++)
      if (total[i] > m) {
        m = total[i];
        w = i;
      }
    return w;
  };
  const s = new Float64Array(ne).fill(1);
  let w = worst();
  const before = w < 0 ? 0 : total[w];
  const goal = targetPercent * (1 - 1e-9);
  let feasible = true;
  for (let iter = 0; w >= 0 && total[w] > goal; iter++) {
    if (iter > 20 * ne + 100) {
      feasible = false;
      break;
    }
    let best = -1;
    let bestC = 0;
    for (let e = 0; e < ne; e++) {
      const c = s[e] * contributions[e][w];
      if (adjustable[e] && c > bestC) {
        bestC = c;
        best = e;
      }
    }
    if (best < 0) {
      feasible = false;
      break;
    }
    const excess = total[w] - goal;
    const old = s[best];
    const next = bestC > excess ? old * ((bestC - excess) / bestC) * (1 - 1e-9) : 0;
    const delta = next - old;
    const c = contributions[best];
    for (let i = 0; i < n; i++) total[i] += delta * c[i];
    s[best] = next;
    w = worst();
  }
  const changes: PlanChange[] = [];
  for (let e = 0; e < ne; e++) {
    if (s[e] < 1) {
      changes.push({
        id: ids[e],
        powerFactor: s[e],
        reductionDb: s[e] > 0 ? -10 * Math.log10(s[e]) : null,
        switchOff: s[e] === 0,
      });
    }
  }
  const after = w < 0 ? 0 : total[w];
  return { maxPercentBefore: before, maxPercentAfter: after, feasible: feasible && after <= targetPercent, changes };
}
