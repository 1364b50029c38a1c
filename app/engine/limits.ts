/**
 * Exposure limits (MPE / reference levels) as functions of frequency.
 *
 * Each table row covers lo < f ≤ hi (MHz); the first row of a table also
 * includes its lower edge. This matches ICNIRP 2020's ">30–400 MHz" notation
 * and, at every shared edge, picks the lower row (the published tables are
 * continuous at their edges, so the choice does not change a number by more
 * than the tables' own rounding). A frequency outside a table is an error.
 *
 * Where a row gives E and H but no power density (low frequencies), the
 * power-density limit used by the engine is the plane-wave equivalent
 * min(E²/η₀, η₀·H²) and the result says so (`sFromTable: false`).
 */
import { EngineInputError } from "./errors";
import { ETA0 } from "./units";

export const STANDARD_IDS = ["fcc", "icnirp-2020", "icnirp-1998", "ieee-c95.1-2019", "sc6-2015"] as const;
export type StandardId = (typeof STANDARD_IDS)[number];
export const TIERS = ["general", "occupational"] as const;
export type Tier = (typeof TIERS)[number];

type Fn = (f: number) => number;
interface Row {
  lo: number;
  hi: number;
  /** Power density, W/m². */
  s?: Fn;
  /** Electric field strength, V/m (rms). */
  e?: Fn;
  /** Magnetic field strength, A/m (rms). */
  h?: Fn;
}
interface TierTable {
  rows: Row[];
  /** Averaging time in minutes at frequency f (MHz). */
  averagingMinutes: Fn;
  /** The document and table this tier comes from. */
  source: string;
}

export interface Limit {
  standard: StandardId;
  tier: Tier;
  frequencyMHz: number;
  /** Power-density limit, W/m². */
  sWm2: number;
  /** True where S is the table's own value, false where it is the plane-wave equivalent of E and H. */
  sFromTable: boolean;
  /** Electric-field limit, V/m, where the table gives one. */
  eVm: number | null;
  /** Magnetic-field limit, A/m, where the table gives one. */
  hAm: number | null;
  averagingMinutes: number;
  /** The table row, MHz. */
  rangeMHz: [number, number];
  source: string;
}

const k = (v: number): Fn => () => v;

/** 47 CFR §1.1310(e)(1), Table 1 — S in the rule is mW/cm²; ×10 gives W/m². */
const FCC: Record<Tier, TierTable> = {
  occupational: {
    source: "47 CFR §1.1310(e)(1) Table 1 (A), occupational/controlled",
    averagingMinutes: k(6),
    rows: [
      { lo: 0.3, hi: 3.0, e: k(614), h: k(1.63), s: k(1000) },
      { lo: 3.0, hi: 30, e: (f) => 1842 / f, h: (f) => 4.89 / f, s: (f) => 9000 / (f * f) },
      { lo: 30, hi: 300, e: k(61.4), h: k(0.163), s: k(10) },
      { lo: 300, hi: 1500, s: (f) => f / 30 },
      { lo: 1500, hi: 100_000, s: k(50) },
    ],
  },
  general: {
    source: "47 CFR §1.1310(e)(1) Table 1 (B), general population/uncontrolled",
    averagingMinutes: k(30),
    rows: [
      { lo: 0.3, hi: 1.34, e: k(614), h: k(1.63), s: k(1000) },
      { lo: 1.34, hi: 30, e: (f) => 824 / f, h: (f) => 2.19 / f, s: (f) => 1800 / (f * f) },
      { lo: 30, hi: 300, e: k(27.5), h: k(0.073), s: k(2) },
      { lo: 300, hi: 1500, s: (f) => f / 150 },
      { lo: 1500, hi: 100_000, s: k(10) },
    ],
  },
};

/** ICNIRP 2020, Health Physics 118(5):483–524, Table 5 (whole body, 30 min). */
const ICNIRP2020: Record<Tier, TierTable> = {
  occupational: {
    source: "ICNIRP 2020 Table 5, occupational, whole-body average",
    averagingMinutes: k(30),
    rows: [
      { lo: 0.1, hi: 30, e: (f) => 660 / f ** 0.7, h: (f) => 4.9 / f },
      { lo: 30, hi: 400, e: k(61), h: k(0.16), s: k(10) },
      { lo: 400, hi: 2000, e: (f) => 3 * Math.sqrt(f), h: (f) => 0.008 * Math.sqrt(f), s: (f) => f / 40 },
      { lo: 2000, hi: 300_000, s: k(50) },
    ],
  },
  general: {
    source: "ICNIRP 2020 Table 5, general public, whole-body average",
    averagingMinutes: k(30),
    rows: [
      { lo: 0.1, hi: 30, e: (f) => 300 / f ** 0.7, h: (f) => 2.2 / f },
      { lo: 30, hi: 400, e: k(27.7), h: k(0.073), s: k(2) },
      { lo: 400, hi: 2000, e: (f) => 1.375 * Math.sqrt(f), h: (f) => 0.0037 * Math.sqrt(f), s: (f) => f / 200 },
      { lo: 2000, hi: 300_000, s: k(10) },
    ],
  },
};

/** ICNIRP 1998 averaging: 6 min up to 10 GHz, 68/f_GHz^1.05 min above (Tables 6–7, notes). */
const icnirp1998Avg: Fn = (f) => (f <= 10_000 ? 6 : 68 / (f / 1000) ** 1.05);

/** ICNIRP 1998, Health Physics 74(4):494–522, Table 6 (occupational) and Table 7 (general public). */
const ICNIRP1998: Record<Tier, TierTable> = {
  occupational: {
    source: "ICNIRP 1998 Table 6, occupational",
    averagingMinutes: icnirp1998Avg,
    rows: [
      { lo: 0.065, hi: 1, e: k(610), h: (f) => 1.6 / f },
      { lo: 1, hi: 10, e: (f) => 610 / f, h: (f) => 1.6 / f },
      { lo: 10, hi: 400, e: k(61), h: k(0.16), s: k(10) },
      { lo: 400, hi: 2000, e: (f) => 3 * Math.sqrt(f), h: (f) => 0.008 * Math.sqrt(f), s: (f) => f / 40 },
      { lo: 2000, hi: 300_000, e: k(137), h: k(0.36), s: k(50) },
    ],
  },
  general: {
    source: "ICNIRP 1998 Table 7, general public",
    averagingMinutes: icnirp1998Avg,
    rows: [
      { lo: 0.15, hi: 1, e: k(87), h: (f) => 0.73 / f },
      { lo: 1, hi: 10, e: (f) => 87 / Math.sqrt(f), h: (f) => 0.73 / f },
      { lo: 10, hi: 400, e: k(28), h: k(0.073), s: k(2) },
      { lo: 400, hi: 2000, e: (f) => 1.375 * Math.sqrt(f), h: (f) => 0.0037 * Math.sqrt(f), s: (f) => f / 200 },
      { lo: 2000, hi: 300_000, e: k(61), h: k(0.16), s: k(10) },
    ],
  },
};

/**
 * IEEE C95.1-2019, whole-body exposure reference levels (ERLs), restricted and
 * unrestricted environments, 100 MHz–300 GHz. Below 100 MHz the standard gives
 * separate E- and H-based equivalents that could not be confirmed against the
 * document, so those rows are not implemented: such a frequency is an error.
 * Averaging 30 min (unrestricted) / 6 min (restricted) — from memory.
 */
const IEEE2019: Record<Tier, TierTable> = {
  occupational: {
    source: "IEEE C95.1-2019 ERLs, restricted environment",
    averagingMinutes: k(6),
    rows: [
      { lo: 100, hi: 400, e: k(61.4), h: k(0.163), s: k(10) },
      { lo: 400, hi: 2000, s: (f) => f / 40 },
      { lo: 2000, hi: 300_000, s: k(50) },
    ],
  },
  general: {
    source: "IEEE C95.1-2019 ERLs, unrestricted environment",
    averagingMinutes: k(30),
    rows: [
      { lo: 100, hi: 400, e: k(27.5), h: k(0.0729), s: k(2) },
      { lo: 400, hi: 2000, s: (f) => f / 200 },
      { lo: 2000, hi: 300_000, s: k(10) },
    ],
  },
};

/** SC6 averaging: 6 min up to 6 GHz, 616 000/f^1.2 min above (f in MHz) — from memory. */
const sc6Avg: Fn = (f) => (f <= 6000 ? 6 : 616_000 / f ** 1.2);

/** Health Canada Safety Code 6 (2015), Table 5 (uncontrolled) and Table 6 (controlled), 10 MHz–300 GHz. */
const SC6: Record<Tier, TierTable> = {
  general: {
    source: "Safety Code 6 (2015) Table 5, uncontrolled environment",
    averagingMinutes: sc6Avg,
    rows: [
      { lo: 10, hi: 20, e: k(27.46), h: k(0.0728), s: k(2) },
      { lo: 20, hi: 48, e: (f) => 58.07 / f ** 0.25, h: (f) => 0.154 / f ** 0.25, s: (f) => 8.944 / Math.sqrt(f) },
      { lo: 48, hi: 300, e: k(22.06), h: k(0.05852), s: k(1.291) },
      {
        lo: 300,
        hi: 6000,
        e: (f) => 3.142 * f ** 0.3417,
        h: (f) => 0.008335 * f ** 0.3417,
        s: (f) => 0.02619 * f ** 0.6834,
      },
      { lo: 6000, hi: 150_000, e: k(61.4), h: k(0.163), s: k(10) },
      { lo: 150_000, hi: 300_000, e: (f) => 0.158 * Math.sqrt(f), h: (f) => 4.21e-4 * Math.sqrt(f), s: (f) => 6.67e-5 * f },
    ],
  },
  occupational: {
    source: "Safety Code 6 (2015) Table 6, controlled environment",
    averagingMinutes: sc6Avg,
    rows: [
      { lo: 10, hi: 20, e: k(61.4), h: k(0.163), s: k(10) },
      { lo: 20, hi: 48, e: (f) => 129.8 / f ** 0.25, h: (f) => 0.3444 / f ** 0.25, s: (f) => 44.72 / Math.sqrt(f) },
      { lo: 48, hi: 100, e: k(49.33), h: k(0.1309), s: k(6.455) },
      { lo: 100, hi: 6000, e: (f) => 15.6 * f ** 0.25, h: (f) => 0.04138 * f ** 0.25, s: (f) => 0.6455 * Math.sqrt(f) },
      { lo: 6000, hi: 150_000, e: k(137), h: k(0.364), s: k(50) },
      { lo: 150_000, hi: 300_000, e: (f) => 0.354 * Math.sqrt(f), h: (f) => 9.4e-4 * Math.sqrt(f), s: (f) => 3.33e-4 * f },
    ],
  },
};

const TABLES: Record<StandardId, Record<Tier, TierTable>> = {
  fcc: FCC,
  "icnirp-2020": ICNIRP2020,
  "icnirp-1998": ICNIRP1998,
  "ieee-c95.1-2019": IEEE2019,
  "sc6-2015": SC6,
};

/** The frequency range (MHz) a standard's tier covers. */
export function limitRangeMHz(standard: StandardId, tier: Tier): [number, number] {
  const rows = TABLES[standard][tier].rows;
  return [rows[0].lo, rows[rows.length - 1].hi];
}

/** The full limit (S, E, H, averaging time) of one standard and tier at f MHz; throws outside the table. */
export function limitAt(standard: StandardId, tier: Tier, frequencyMHz: number, field = "frequencyMHz"): Limit {
  const table = TABLES[standard]?.[tier];
  if (!table) throw new EngineInputError("standard", `unknown standard/tier ${standard}/${tier}`);
  const rows = table.rows;
  const f = frequencyMHz;
  let row: Row | undefined;
  if (Number.isFinite(f)) {
    for (let i = 0; i < rows.length; i++) {
      const r = rows[i];
      if ((f > r.lo || (i === 0 && f === r.lo)) && f <= r.hi) {
        row = r;
        break;
      }
    }
  }
  if (!row) {
    const [lo, hi] = limitRangeMHz(standard, tier);
    throw new EngineInputError(field, `${f} MHz is outside the ${standard} ${tier} table (${lo}–${hi} MHz)`);
  }
  const e = row.e ? row.e(f) : null;
  const h = row.h ? row.h(f) : null;
  let s: number;
  let fromTable = true;
  if (row.s) s = row.s(f);
  else {
    // Plane-wave equivalent of the E and H reference levels: S = E²/η₀ and S = η₀H², the stricter.
    fromTable = false;
    s = Math.min(e !== null ? (e * e) / ETA0 : Infinity, h !== null ? ETA0 * h * h : Infinity);
  }
  return {
    standard,
    tier,
    frequencyMHz: f,
    sWm2: s,
    sFromTable: fromTable,
    eVm: e,
    hAm: h,
    averagingMinutes: table.averagingMinutes(f),
    rangeMHz: [row.lo, row.hi],
    source: table.source,
  };
}

/** Power-density limit, W/m², of one standard and tier at f MHz; throws outside the table. */
export function powerDensityLimitWm2(standard: StandardId, tier: Tier, frequencyMHz: number): number {
  return limitAt(standard, tier, frequencyMHz).sWm2;
}

/** Every row edge of a standard's tier (for tests and for UIs that draw the limit curve). */
export function limitEdgesMHz(standard: StandardId, tier: Tier): number[] {
  const rows = TABLES[standard][tier].rows;
  return [rows[0].lo, ...rows.map((r) => r.hi)];
}
