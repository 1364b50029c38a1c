/**
 * FCC 47 CFR §1.1307(b)(3)(i)(C): MPE-based exemption from routine RF
 * evaluation for a single fixed RF source (2019 RF Order, FCC 19-126).
 * Threshold ERP (W) as a function of f (MHz) and separation R (m):
 *   0.3–1.34 MHz: 1 920·R²       1.34–30: 3 450·R²/f²     30–300: 3.83·R²
 *   300–1 500: 0.0128·R²·f       1 500–100 000: 19.2·R²
 * Each equals S_lim(general)·π·R²/1.64, i.e. S = EIRP/(πR²): a power
 * reflection factor of 4. Applies only where R ≥ λ/2π.
 */
import { EngineInputError } from "./errors";
import { C0 } from "./units";

const ROWS: { lo: number; hi: number; t: (f: number, r2: number) => number }[] = [
  { lo: 0.3, hi: 1.34, t: (_f, r2) => 1920 * r2 },
  { lo: 1.34, hi: 30, t: (f, r2) => (3450 * r2) / (f * f) },
  { lo: 30, hi: 300, t: (_f, r2) => 3.83 * r2 },
  { lo: 300, hi: 1500, t: (f, r2) => 0.0128 * r2 * f },
  { lo: 1500, hi: 100_000, t: (_f, r2) => 19.2 * r2 },
];

/** λ/2π in metres (≈ 47.7/f with f in MHz): the distance from which the table applies. */
export const exemptionMinDistanceM = (frequencyMHz: number): number => C0 / (frequencyMHz * 1e6) / (2 * Math.PI);

/** Threshold ERP (W) of §1.1307(b)(3)(i)(C) at f MHz and R m; throws outside 0.3 MHz–100 GHz. */
export function fccExemptionThresholdErpW(frequencyMHz: number, distanceM: number): number {
  const f = frequencyMHz;
  for (let i = 0; i < ROWS.length; i++) {
    const r = ROWS[i];
    if ((f > r.lo || (i === 0 && f === r.lo)) && f <= r.hi) return r.t(f, distanceM * distanceM);
  }
  throw new EngineInputError("frequencyMHz", `${f} MHz is outside the §1.1307(b)(3)(i)(C) table (0.3–100 000 MHz)`);
}

export interface ExemptionResult {
  frequencyMHz: number;
  distanceM: number;
  erpW: number;
  /** Null where the frequency is outside the rule's table. */
  thresholdErpW: number | null;
  /** λ/2π: the table applies only at R ≥ this distance. */
  minDistanceM: number;
  applicable: boolean;
  exempt: boolean;
  reason: string;
}

const inTable = (f: number) => f >= ROWS[0].lo && f <= ROWS[ROWS.length - 1].hi;

/**
 * Screen one source: exempt when R ≥ λ/2π and ERP ≤ the threshold. Outside the
 * table's 0.3 MHz–100 GHz the exemption does not apply (not an error: the
 * request may be under another standard).
 */
export function fccMpeExemption(input: { frequencyMHz: number; erpW: number; distanceM: number }): ExemptionResult {
  if (!(input.distanceM > 0)) throw new EngineInputError("distanceM", "must be > 0");
  if (!(input.erpW >= 0)) throw new EngineInputError("erpW", "must be ≥ 0");
  const minD = exemptionMinDistanceM(input.frequencyMHz);
  if (!inTable(input.frequencyMHz)) {
    const reason = `${input.frequencyMHz} MHz is outside the §1.1307(b)(3)(i)(C) table (0.3–100 000 MHz): the MPE-based exemption does not apply`;
    return { ...input, thresholdErpW: null, minDistanceM: minD, applicable: false, exempt: false, reason };
  }
  const threshold = fccExemptionThresholdErpW(input.frequencyMHz, input.distanceM);
  const applicable = input.distanceM >= minD;
  const exempt = applicable && input.erpW <= threshold;
  const reason = !applicable
    ? `R = ${input.distanceM} m is less than λ/2π = ${minD.toFixed(3)} m: the MPE-based exemption does not apply`
    : exempt
      ? `ERP ${input.erpW} W ≤ threshold ${threshold.toPrecision(4)} W: exempt from routine evaluation`
      : `ERP ${input.erpW} W > threshold ${threshold.toPrecision(4)} W: evaluation required`;
  return { ...input, thresholdErpW: threshold, minDistanceM: minD, applicable, exempt, reason };
}
