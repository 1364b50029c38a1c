/**
 * Antenna pattern attenuation relative to boresight, in dB (≥ 0 means weaker
 * than boresight). Angles are off-boresight in the antenna's own frame:
 * φ horizontal (positive clockwise seen from above), θ vertical (positive up).
 * All functions take radians.
 */

/** Pattern description as accepted by the request schema. */
export type PatternSpec =
  | "isotropic"
  | { type: "isotropic" }
  | {
      type: "3gpp-38.901";
      hBeamwidthDeg: number;
      vBeamwidthDeg: number;
      maxAttenuationDb?: number;
      sideLobeDb?: number;
    }
  | { type: "itu-r-f.1336-sectoral"; hBeamwidthDeg: number; vBeamwidthDeg: number; kH?: number; kV?: number; kP?: number }
  | {
      type: "tabulated";
      horizontal: { angleDeg: number; attenuationDb: number }[];
      vertical: { angleDeg: number; attenuationDb: number }[];
      maxAttenuationDb?: number;
    };

export const PATTERN_ISOTROPIC = 0;
export const PATTERN_3GPP = 1;
export const PATTERN_F1336 = 2;
export const PATTERN_TABULATED = 3;

/** Plain-number pattern constants, hoisted once per emitter. */
export interface PreparedPattern {
  kind: number;
  /** Horizontal / vertical half-power beamwidths, radians (0 where not defined). */
  h3: number;
  v3: number;
  /** 3GPP: 12/φ3², 12/θ3² (per rad²), A_max, SLA_V (dB). */
  cH: number;
  cV: number;
  am: number;
  sla: number;
  /** F.1336 constants (see attenuationF1336): k_h, k_v. */
  kH: number;
  kV: number;
  xk: number;
  lambdaKh: number;
  lambdaKv: number;
  cC: number;
  g180: number;
  ghrBack: number;
  /** F.1336 G_hr at |φ| = i·F_STEP_DEG (0…180°) and G_vr at |θ| = i·F_STEP_DEG (0…90°), dB. */
  ghrT: Float64Array;
  gvrT: Float64Array;
  /**
   * 3GPP gain tables in squared variables, so the kernel needs neither sqrt nor
   * atan nor exp (linear interpolation on N_TABLE intervals, relative error < 10⁻⁶):
   * vertical V(τ) = max(10^(−12·atan(√τ)²/θ3²/10), 10^(−SLA_V/10)), τ = tan²θ ∈ [0, vTauMax];
   * horizontal H(c) = 10^(−12·acos(c)²/φ3²/10), c = cos φ ∈ [hCmin, 1], hCmin = cos φ_cap
   * (12(φ_cap/φ3)² = A_max); acos(c)² is smooth on it (singular only at c = −1).
   * Empty when θ_SLA ≥ 80° or φ_cap ≥ 170° (the kernel then uses atan and exp).
   */
  vTable: Float64Array;
  /**
   * The same vertical gain divided by 1 + τ, interleaved with 1/(1 + τ):
   * [V(τ₀)/(1+τ₀), 1/(1+τ₀), V(τ₁)/(1+τ₁), …], so that with R² = R_h²(1 + τ) the
   * kernel needs no division per height (percent = k·V/R² = k·(V/(1+τ))/R_h²).
   */
  vOverR: Float64Array;
  vTauMax: number;
  vInvStep: number;
  gSla: number;
  hTable: Float64Array;
  hCmin: number;
  hInvStep: number;
  /**
   * Vertical table for wide beams (θ_SLA ≥ 80°, where tan²θ is unbounded): V in
   * c_θ = cos θ = ρ/R ∈ [0, 1], V(c) = max(10^(−12·acos(c)²/θ3²/10), g_SLA) at N_TABLE intervals.
   */
  vcTable: Float64Array;
  /** Tabulated cuts, sorted on [0, 360) degrees, wrapped. */
  /** Tabulated cuts resampled at TAB_STEP_DEG on [0°, 360°] (TAB_N + 1 values), dB. */
  hRes: Float64Array;
  vRes: Float64Array;
  hAng: Float64Array;
  hAtt: Float64Array;
  vAng: Float64Array;
  vAtt: Float64Array;
}

const RAD = Math.PI / 180;
const EMPTY = new Float64Array(0);

function blank(kind: number): PreparedPattern {
  return {
    kind,
    h3: 0,
    v3: 0,
    cH: 0,
    cV: 0,
    am: Infinity,
    sla: Infinity,
    kH: 0,
    kV: 0,
    xk: 0,
    lambdaKh: 0,
    lambdaKv: 0,
    cC: 0,
    g180: 0,
    ghrBack: 0,
    ghrT: EMPTY,
    gvrT: EMPTY,
    vTable: EMPTY,
    vOverR: EMPTY,
    vTauMax: 0,
    vInvStep: 0,
    gSla: 0,
    hTable: EMPTY,
    hCmin: 1,
    hInvStep: 0,
    vcTable: EMPTY,
    hRes: EMPTY,
    vRes: EMPTY,
    hAng: EMPTY,
    hAtt: EMPTY,
    vAng: EMPTY,
    vAtt: EMPTY,
  };
}

export const N_TABLE = 8192;
const vTables = new Map<string, Float64Array>();
const hTables = new Map<string, Float64Array>();

/** Memoised vertical table V(τ) (see PreparedPattern.vTable); depends only on (12/θ3², SLA_V). */
function verticalTable(cV: number, sla: number, tauMax: number): Float64Array {
  const key = `${cV}|${sla}`;
  let t = vTables.get(key);
  if (!t) {
    t = new Float64Array(N_TABLE + 2);
    const gSla = 10 ** (-sla / 10);
    for (let i = 0; i < t.length; i++) {
      const th = Math.atan(Math.sqrt((i * tauMax) / N_TABLE));
      const g = 10 ** (-(cV * th * th) / 10);
      t[i] = g > gSla ? g : gSla;
    }
    if (vTables.size > 64) vTables.clear();
    vTables.set(key, t);
  }
  return t;
}

/** Memoised V(τ)/(1+τ) and 1/(1+τ), interleaved (see PreparedPattern.vOverR). */
function verticalOverRTable(v: Float64Array, cV: number, sla: number, tauMax: number): Float64Array {
  const key = `overR|${cV}|${sla}`;
  let t = vTables.get(key);
  if (!t) {
    t = new Float64Array(2 * v.length);
    for (let i = 0; i < v.length; i++) {
      const b = 1 / (1 + (i * tauMax) / N_TABLE);
      t[2 * i] = v[i] * b;
      t[2 * i + 1] = b;
    }
    if (vTables.size > 64) vTables.clear();
    vTables.set(key, t);
  }
  return t;
}

/** Memoised wide-beam vertical table V(cos θ) (see PreparedPattern.vcTable). */
function verticalCosTable(cV: number, sla: number): Float64Array {
  const key = `cos|${cV}|${sla}`;
  let t = vTables.get(key);
  if (!t) {
    t = new Float64Array(N_TABLE + 2);
    const gSla = 10 ** (-sla / 10);
    for (let i = 0; i < t.length; i++) {
      const th = Math.acos(Math.min(1, i / N_TABLE));
      const g = 10 ** (-(cV * th * th) / 10);
      t[i] = g > gSla ? g : gSla;
    }
    if (vTables.size > 64) vTables.clear();
    vTables.set(key, t);
  }
  return t;
}

/** Memoised horizontal table H(c) (see PreparedPattern.hTable); depends only on (12/φ3², c_min). */
function horizontalTable(cH: number, cMin: number): Float64Array {
  const key = `${cH}|${cMin}`;
  let t = hTables.get(key);
  if (!t) {
    t = new Float64Array(N_TABLE + 2);
    for (let i = 0; i < t.length; i++) {
      const phi = Math.acos(Math.min(1, cMin + (i * (1 - cMin)) / N_TABLE));
      t[i] = 10 ** (-(cH * phi * phi) / 10);
    }
    if (hTables.size > 64) hTables.clear();
    hTables.set(key, t);
  }
  return t;
}

/** Sort a cut onto [0, 360) degrees; duplicates keep the last value. */
function prepareCut(cut: { angleDeg: number; attenuationDb: number }[]): [Float64Array, Float64Array] {
  const pts = cut.map((p) => [((p.angleDeg % 360) + 360) % 360, p.attenuationDb] as const);
  pts.sort((a, b) => a[0] - b[0]);
  const ang: number[] = [];
  const att: number[] = [];
  for (const [a, v] of pts) {
    if (ang.length && ang[ang.length - 1] === a) att[att.length - 1] = v;
    else {
      ang.push(a);
      att.push(v);
    }
  }
  return [Float64Array.from(ang), Float64Array.from(att)];
}

/** Hoist the per-emitter pattern constants. */
export function preparePattern(spec: PatternSpec | undefined): PreparedPattern {
  if (spec === undefined || spec === "isotropic" || spec.type === "isotropic") return blank(PATTERN_ISOTROPIC);
  if (spec.type === "3gpp-38.901") {
    const p = blank(PATTERN_3GPP);
    p.h3 = spec.hBeamwidthDeg * RAD;
    p.v3 = spec.vBeamwidthDeg * RAD;
    p.cH = 12 / (p.h3 * p.h3);
    p.cV = 12 / (p.v3 * p.v3);
    p.am = spec.maxAttenuationDb ?? 30;
    p.sla = spec.sideLobeDb ?? 30;
    p.gSla = 10 ** (-p.sla / 10);
    const thSla = Math.sqrt(p.sla / p.cV);
    if (thSla > 1e-6 && thSla < 80 * RAD) {
      p.vTauMax = Math.tan(thSla) ** 2;
      p.vInvStep = N_TABLE / p.vTauMax;
      p.vTable = verticalTable(p.cV, p.sla, p.vTauMax);
      p.vOverR = verticalOverRTable(p.vTable, p.cV, p.sla, p.vTauMax);
    } else if (thSla > 1e-6) {
      p.vcTable = verticalCosTable(p.cV, p.sla);
    }
    const phiCap = Math.sqrt(p.am / p.cH);
    if (phiCap > 1e-6 && phiCap < 170 * RAD) {
      p.hCmin = Math.cos(phiCap);
      p.hInvStep = N_TABLE / (1 - p.hCmin);
      p.hTable = horizontalTable(p.cH, p.hCmin);
    }
    return p;
  }
  if (spec.type === "itu-r-f.1336-sectoral") {
    const p = blank(PATTERN_F1336);
    const phi3 = spec.hBeamwidthDeg;
    const th3 = spec.vBeamwidthDeg;
    // Rec. ITU-R F.1336-5 recommends 3.1.1 (peak side lobes, 0.4–6 GHz); defaults are the
    // "typical" antenna values k_h = 0.8, k_v = 0.7, k_p = 0.7 (from memory, agreeing with a
    // third-party transcription of the Recommendation).
    const kH = spec.kH ?? 0.8;
    const kV = spec.kV ?? 0.7;
    const kP = spec.kP ?? 0.7;
    p.h3 = phi3 * RAD;
    p.v3 = th3 * RAD;
    p.kH = kH;
    p.kV = kV;
    p.xk = Math.sqrt(1 - 0.36 * kV);
    p.lambdaKh = 3 * (1 - 0.5 ** -kH);
    p.g180 = -12 + 10 * Math.log10(1 + 8 * kP) - 15 * Math.log10(180 / th3);
    // Attenuation incline factor C; the factor 10 makes G_vr continuous at x_v = 90/θ3, where it meets G180.
    p.cC = (10 * Math.log10(((180 / th3) ** 1.5 * (4 ** -1.5 + kV)) / (1 + 8 * kP))) / Math.log10(22.5 / th3);
    p.lambdaKv = 12 - p.cC * Math.log10(4) - 10 * Math.log10(4 ** -1.5 + kV);
    p.ghrBack = f1336Ghr(p, 180 / phi3);
    const key = `${phi3}|${th3}|${kH}|${kV}|${kP}`;
    let tables = f1336Tables.get(key);
    if (!tables) {
      const gh = new Float64Array(F_NH + 2);
      for (let i = 0; i < gh.length; i++) gh[i] = f1336Ghr(p, (Math.min(i, F_NH) * F_STEP_DEG) / phi3);
      const gv = new Float64Array(F_NV + 2);
      for (let i = 0; i < gv.length; i++) gv[i] = f1336Gvr(p, (Math.min(i, F_NV) * F_STEP_DEG) / th3);
      tables = [gh, gv];
      if (f1336Tables.size > 64) f1336Tables.clear();
      f1336Tables.set(key, tables);
    }
    [p.ghrT, p.gvrT] = tables;
    return p;
  }
  const p = blank(PATTERN_TABULATED);
  [p.hAng, p.hAtt] = prepareCut(spec.horizontal);
  [p.vAng, p.vAtt] = prepareCut(spec.vertical);
  p.am = spec.maxAttenuationDb ?? Infinity;
  p.hRes = resampleCut(p.hAng, p.hAtt);
  p.vRes = resampleCut(p.vAng, p.vAtt);
  p.h3 = tabulatedBeamwidthDeg(p.hAng, p.hAtt) * RAD;
  p.v3 = tabulatedBeamwidthDeg(p.vAng, p.vAtt) * RAD;
  return p;
}

/**
 * 3GPP TR 38.901 §7.3, Table 7.3-1 element pattern, used as a relative pattern:
 * A = min( min(12(φ/φ3dB)², A_max) + min(12(θ/θ3dB)², SLA_V), A_max ).
 */
export function attenuation3gpp(p: PreparedPattern, phi: number, theta: number): number {
  let ah = p.cH * phi * phi;
  if (ah > p.am) ah = p.am;
  let av = p.cV * theta * theta;
  if (av > p.sla) av = p.sla;
  const a = ah + av;
  return a > p.am ? p.am : a;
}

/** F.1336-5 horizontal relative gain G_hr(x_h), dB (≤ 0), floored at G180. */
function f1336Ghr(p: PreparedPattern, xh: number): number {
  const g = xh <= 0.5 ? -12 * xh * xh : -12 * xh ** (2 - p.kH) - p.lambdaKh;
  return g < p.g180 ? p.g180 : g;
}

/** F.1336-5 vertical relative gain G_vr(x_v), dB (≤ 0), floored at G180. */
function f1336Gvr(p: PreparedPattern, xv: number): number {
  let g: number;
  if (xv < p.xk) g = -12 * xv * xv;
  else if (xv < 4) g = -12 + 10 * Math.log10(xv ** -1.5 + p.kV);
  else if (xv < 90 / (p.v3 / RAD)) g = -p.lambdaKv - p.cC * Math.log10(xv);
  else g = p.g180;
  return g < p.g180 ? p.g180 : g;
}

/** F.1336 tables' step: 0.01° (interpolation error below 10⁻⁴ dB for θ3 ≥ 2°). */
export const F_STEP_DEG = 0.01;
const F_NH = 18_000;
const f1336Tables = new Map<string, [Float64Array, Float64Array]>();
const F_NV = 9_000;

/**
 * Rec. ITU-R F.1336-5 recommends 3.1.1, sectoral reference pattern (peak side
 * lobes), as a relative pattern: G = G_hr(x_h) + R·G_vr(x_v), R = (G_hr(x_h) −
 * G_hr(180/φ3)) / (G_hr(0) − G_hr(180/φ3)), x_h = |φ|/φ3, x_v = |θ|/θ3 (from memory).
 * This is the exact formula; attenuationF1336 reads the same G_hr and G_vr from
 * 0.01° tables.
 */
export function attenuationF1336Exact(p: PreparedPattern, phi: number, theta: number): number {
  const ghr = f1336Ghr(p, Math.abs(phi) / p.h3);
  return f1336Combine(p, ghr, f1336Gvr(p, Math.abs(theta) / p.v3));
}

function f1336Combine(p: PreparedPattern, ghr: number, gvr: number): number {
  const r = p.ghrBack === 0 ? 1 : (ghr - p.ghrBack) / (0 - p.ghrBack);
  const a = -(ghr + r * gvr);
  return a > -p.g180 ? -p.g180 : a < 0 ? 0 : a;
}

/** F.1336-5 sectoral pattern through its 0.01° tables (what the engine uses everywhere). */
export function attenuationF1336(p: PreparedPattern, phi: number, theta: number): number {
  return f1336FromTables(p, (Math.abs(phi) / RAD) / F_STEP_DEG, (Math.abs(theta) / RAD) / F_STEP_DEG);
}

/** F.1336 attenuation at table positions xh = |φ|/0.01°, xv = |θ|/0.01° (clamped to the tables). */
export function f1336FromTables(p: PreparedPattern, xh: number, xv: number): number {
  if (xh > F_NH) xh = F_NH;
  if (xv > F_NV) xv = F_NV;
  const ih = xh | 0;
  const iv = xv | 0;
  const th = p.ghrT;
  const tv = p.gvrT;
  const ghr = th[ih] + (xh - ih) * (th[ih + 1] - th[ih]);
  const gvr = tv[iv] + (xv - iv) * (tv[iv + 1] - tv[iv]);
  return f1336Combine(p, ghr, gvr);
}

/** Linear interpolation on a wrapped 360° cut (angles sorted on [0, 360)). */
export function interpolateCut(ang: Float64Array, att: Float64Array, deg: number): number {
  const n = ang.length;
  if (n === 1) return att[0];
  let a = deg % 360;
  if (a < 0) a += 360;
  // binary search for the last index with ang[i] ≤ a
  let lo = 0;
  let hi = n - 1;
  if (a < ang[0] || a >= ang[n - 1]) {
    const a0 = ang[n - 1];
    const a1 = ang[0] + 360;
    const x = a < ang[0] ? a + 360 : a;
    const t = (x - a0) / (a1 - a0);
    return att[n - 1] + t * (att[0] - att[n - 1]);
  }
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (ang[mid] <= a) lo = mid;
    else hi = mid;
  }
  const t = (a - ang[lo]) / (ang[hi] - ang[lo]);
  return att[lo] + t * (att[hi] - att[lo]);
}

/** Resampling step of tabulated cuts: 0.1°, so a cut given at multiples of 0.1° is reproduced exactly. */
export const TAB_STEP_DEG = 0.1;
export const TAB_N = 3600;

/** A cut resampled at TAB_STEP_DEG on [0°, 360°] by its own linear interpolation. */
function resampleCut(ang: Float64Array, att: Float64Array): Float64Array {
  const t = new Float64Array(TAB_N + 2);
  for (let i = 0; i < t.length; i++) t[i] = interpolateCut(ang, att, Math.min(i, TAB_N) * TAB_STEP_DEG);
  return t;
}

/** Linear interpolation in a resampled cut at a (wrapped) angle in degrees. */
export function resampledAt(t: Float64Array, deg: number): number {
  let a = deg % 360;
  if (a < 0) a += 360;
  const x = a / TAB_STEP_DEG;
  const i = x | 0;
  return t[i] + (x - i) * (t[i + 1] - t[i]);
}

/**
 * Tabulated horizontal and vertical cuts combined by summation (the usual
 * "2D interpolation by summing cuts"): A = A_H(φ) + A_V(θ), capped at the
 * pattern's maxAttenuationDb when given; each cut interpolated linearly in dB
 * (resampled at 0.1°, exact for cuts given at multiples of 0.1°). The vertical
 * cut's angle is measured positive BELOW boresight (the convention of common
 * antenna pattern files and of tiltDeg), so θ (positive up) is looked up at −θ.
 */
export function attenuationTabulated(p: PreparedPattern, phi: number, theta: number): number {
  const a = resampledAt(p.hRes, phi / RAD) + resampledAt(p.vRes, -theta / RAD);
  return a > p.am ? p.am : a;
}

/** Half-power (3 dB) beamwidth of a tabulated cut, degrees, relative to its value at 0°. */
export function tabulatedBeamwidthDeg(ang: Float64Array, att: Float64Array): number {
  const ref = interpolateCut(ang, att, 0) + 3;
  let right = 180;
  for (let d = 0.1; d <= 180; d += 0.1) {
    if (interpolateCut(ang, att, d) >= ref) {
      right = d;
      break;
    }
  }
  let left = 180;
  for (let d = 0.1; d <= 180; d += 0.1) {
    if (interpolateCut(ang, att, -d) >= ref) {
      left = d;
      break;
    }
  }
  return Math.min(360, right + left);
}

/** Attenuation (dB) of any prepared pattern at off-boresight angles φ, θ (radians). */
export function patternAttenuationDb(p: PreparedPattern, phi: number, theta: number): number {
  switch (p.kind) {
    case PATTERN_3GPP:
      return attenuation3gpp(p, phi, theta);
    case PATTERN_F1336:
      return attenuationF1336(p, phi, theta);
    case PATTERN_TABULATED:
      return attenuationTabulated(p, phi, theta);
    default:
      return 0;
  }
}
