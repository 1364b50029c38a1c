/**
 * The hot path: per-emitter constants hoisted once (prepareEmitter), then the
 * percent-of-limit contribution of one emitter at a point (percentAt) or along
 * a grid row at every height (accumulateRow). No allocation per point.
 *
 * Geometry: x east, y north, z up (metres). Azimuth is the bearing of the
 * boresight, clockwise from north (+y); tilt is the mechanical/electrical
 * downtilt, positive below the horizon. In the antenna frame
 *   forward f = dx·sin(az) + dy·cos(az),  side s = dx·cos(az) − dy·sin(az),
 *   f₂ = f·cos(t) − dz·sin(t),            u = f·sin(t) + dz·cos(t),
 *   φ = atan2(s, f₂),                     θ = atan2(u, √(f₂² + s²)),
 * so a point on the tilted boresight (f = R·cos t, dz = −R·sin t) has u = 0.
 */
import { absAtan2, expNeg } from "./fastmath";
import {
  N_TABLE,
  TAB_STEP_DEG,
  F_STEP_DEG,
  f1336FromTables,
  PATTERN_F1336,
  PATTERN_TABULATED,
  patternAttenuationDb,
  PATTERN_3GPP,
  PATTERN_ISOTROPIC,
  type PreparedPattern,
} from "./patterns";

export const MODEL_SPHERICAL = 0;
export const MODEL_CYLINDRICAL = 1;
export const MODEL_AUTO = 2;
export const MODEL_APERTURE = 3;

/** Distances are clamped to 1 cm so a point on an antenna gives a finite (huge) value, never Infinity. */
export const R_MIN = 0.01;
const R2_MIN = R_MIN * R_MIN;
/** 10^(−A/10) = exp(−A·ln10/10). */
const DB_TO_NEPER = Math.LN10 / 10;

export interface PreparedEmitter {
  id: string;
  x: number;
  y: number;
  z: number;
  sinAz: number;
  cosAz: number;
  sinT: number;
  cosT: number;
  model: number;
  pattern: PreparedPattern;
  /** Spherical model: percent = kSph·g/R², kSph = 100·δ·F·EIRP/(4π·S_lim). */
  kSph: number;
  /** Cylindrical model: percent = kCyl/R_h, kCyl = 100·δ·(180/θ)·P/(π·h·S_lim). */
  kCyl: number;
  halfH: number;
  /** Cylindrical/spherical crossover distance R* (auto model). */
  crossR: number;
  /** Half the horizontal beamwidth (rad) and the pattern's attenuation there (cylindrical sector edge). */
  halfBw: number;
  edgeAttDb: number;
  /** Aperture model: near-field extent, far-field start (m) and near-field percent. */
  rnf: number;
  rff: number;
  kNf: number;
}

/** Horizontal-cut attenuation relative to the sector edge, for the cylindrical model (0 inside the sector). */
function cylinderSectorFactor(pe: PreparedEmitter, phi: number): number {
  if (pe.pattern.kind === PATTERN_ISOTROPIC || Math.abs(phi) <= pe.halfBw) return 1;
  const a = patternAttenuationDb(pe.pattern, phi, 0) - pe.edgeAttDb;
  return a > 0 ? Math.exp(-a * DB_TO_NEPER) : 1;
}

/** Spherical-model percent at a point with the pattern applied (OET-65 eq. (3) × pattern). */
function sphericalPercent(pe: PreparedEmitter, f: number, s: number, dz: number, r2: number): number {
  if (pe.pattern.kind === PATTERN_ISOTROPIC) return pe.kSph / r2;
  const f2 = f * pe.cosT - dz * pe.sinT;
  const u = f * pe.sinT + dz * pe.cosT;
  const phi = Math.atan2(s, f2);
  const theta = Math.atan2(u, Math.sqrt(f2 * f2 + s * s));
  const a = patternAttenuationDb(pe.pattern, phi, theta);
  return (pe.kSph * Math.exp(-a * DB_TO_NEPER)) / r2;
}

/** Percent of this emitter's own limit at (x, y, z), any model. */
export function percentAt(pe: PreparedEmitter, x: number, y: number, z: number): number {
  const dx = x - pe.x;
  const dy = y - pe.y;
  const dz = z - pe.z;
  const f = dx * pe.sinAz + dy * pe.cosAz;
  const s = dx * pe.cosAz - dy * pe.sinAz;
  const rh2 = dx * dx + dy * dy;
  let r2 = rh2 + dz * dz;
  if (r2 < R2_MIN) r2 = R2_MIN;
  const model = pe.model;
  if (model === MODEL_APERTURE) {
    const r = Math.sqrt(r2);
    if (r < pe.rff) return r <= pe.rnf ? pe.kNf : (pe.kNf * pe.rnf) / r;
  } else if ((model === MODEL_CYLINDRICAL || model === MODEL_AUTO) && Math.abs(dz) <= pe.halfH) {
    let rh = Math.sqrt(rh2);
    if (rh < R_MIN) rh = R_MIN;
    const sector = cylinderSectorFactor(pe, Math.atan2(s, f));
    if (model === MODEL_CYLINDRICAL || rh < pe.crossR) return (pe.kCyl * sector) / rh;
    // Auto beyond the crossover R*: spherical, but never below the cylindrical value at R*
    // continued as 1/R² — continuous at R*, and the conservative choice in the transition.
    const continued = (pe.kCyl * sector * pe.crossR) / (rh * rh);
    const sph = sphericalPercent(pe, f, s, dz, r2);
    return sph > continued ? sph : continued;
  }
  return sphericalPercent(pe, f, s, dz, r2);
}

/** Scratch buffers a row kernel reuses (one set per thread). */
export interface RowScratch {
  dz: Float64Array;
  dz2: Float64Array;
}
export const rowScratch = (nz: number): RowScratch => ({ dz: new Float64Array(nz), dz2: new Float64Array(nz) });

/**
 * Add one emitter's percent at every (xs[i], y, zs[k]) into acc[i·nz + k].
 * Fast paths for the spherical model (OET-65 eq. (3)) with the isotropic and
 * the 3GPP TR 38.901 patterns: the horizontal part once per column, heights
 * inside, and the pattern's gains read from its tables (patterns.ts: H in cos φ,
 * V in tan²θ, or in cos θ for wide vertical beams) instead of atan/exp; the
 * horizontally capped half-space costs one division. Tabulated cuts and F.1336
 * use their resampled tables. Any other model goes through percentAt, the
 * reference the fast paths are tested against. Each path is its own small
 * function so that it is optimised quickly and on its own type feedback.
 * mask (optional, length ≥ maskOffset + nx): columns with 0 are skipped.
 */
export function accumulateRow(
  pe: PreparedEmitter,
  xs: Float64Array,
  y: number,
  zs: Float64Array,
  acc: Float64Array,
  scratch: RowScratch,
  mask: Uint8Array | null,
  maskOffset: number,
): void {
  const kind = pe.pattern.kind;
  if (pe.model !== MODEL_SPHERICAL) return rowReference(pe, xs, y, zs, acc, mask, maskOffset);
  if (kind === PATTERN_TABULATED || kind === PATTERN_F1336) return accumulateRowTabulated(pe, xs, y, zs, acc, mask, maskOffset);
  if (kind !== PATTERN_ISOTROPIC && kind !== PATTERN_3GPP) return rowReference(pe, xs, y, zs, acc, mask, maskOffset);
  const nz = zs.length;
  const dzs = scratch.dz;
  const dz2s = scratch.dz2;
  for (let k = 0; k < nz; k++) {
    const d = zs[k] - pe.z;
    dzs[k] = d;
    dz2s[k] = d * d;
  }
  if (kind === PATTERN_ISOTROPIC) return rowIsotropic(pe, xs, y, nz, dz2s, acc, mask, maskOffset);
  const p = pe.pattern;
  if (p.vTable.length > 0 && p.hTable.length > 0) {
    if (pe.sinT === 0) return row3gppFlat(pe, xs, y, zs, dz2s, acc, mask, maskOffset);
    return row3gppTilted(pe, xs, y, dzs, dz2s, acc, mask, maskOffset);
  }
  if (p.vcTable.length > 0 && p.hTable.length > 0) return row3gppWide(pe, xs, y, dzs, dz2s, acc, mask, maskOffset);
  return row3gppDirect(pe, xs, y, dzs, dz2s, acc, mask, maskOffset);
}

/** Any model and pattern, point by point. */
function rowReference(
  pe: PreparedEmitter,
  xs: Float64Array,
  y: number,
  zs: Float64Array,
  acc: Float64Array,
  mask: Uint8Array | null,
  maskOffset: number,
): void {
  const nx = xs.length;
  const nz = zs.length;
  for (let i = 0; i < nx; i++) {
    if (mask !== null && mask[maskOffset + i] === 0) continue;
    const x = xs[i];
    const base = i * nz;
    for (let k = 0; k < nz; k++) acc[base + k] += percentAt(pe, x, y, zs[k]);
  }
}

/** Isotropic spherical: percent = k/R². */
function rowIsotropic(
  pe: PreparedEmitter,
  xs: Float64Array,
  y: number,
  nz: number,
  dz2s: Float64Array,
  acc: Float64Array,
  mask: Uint8Array | null,
  maskOffset: number,
): void {
  const nx = xs.length;
  const dy = y - pe.y;
  const dyy = dy * dy;
  const kSph = pe.kSph;
  const ex = pe.x;
  for (let i = 0; i < nx; i++) {
    if (mask !== null && mask[maskOffset + i] === 0) continue;
    const dx = xs[i] - ex;
    const rh2 = dx * dx + dyy;
    const base = i * nz;
    for (let k = 0; k < nz; k++) {
      let r2 = rh2 + dz2s[k];
      if (r2 < R2_MIN) r2 = R2_MIN;
      acc[base + k] += kSph / r2;
    }
  }
}

/**
 * 3GPP pattern, tilt 0: φ and R_h per column; with R² = R_h²·(1 + τ), τ = tan²θ,
 * percent = max(k·H(cos φ)·V(τ), c_min)/R² comes from the V/(1+τ) and 1/(1+τ)
 * tables without a division per height. g = max(H·V, g_min) is
 * A = min(min(A_H, A_max) + min(A_V, SLA_V), A_max) in gain form.
 */
function row3gppFlat(
  pe: PreparedEmitter,
  xs: Float64Array,
  y: number,
  zs: Float64Array,
  dz2s: Float64Array,
  acc: Float64Array,
  mask: Uint8Array | null,
  maskOffset: number,
): void {
  const nx = xs.length;
  const nz = zs.length;
  const p = pe.pattern;
  const kSph = pe.kSph;
  const sinAz = pe.sinAz;
  const cosAz = pe.cosAz;
  const ex = pe.x;
  const dy = y - pe.y;
  const dyy = dy * dy;
  const cMin = kSph * expNeg(-p.am * DB_TO_NEPER);
  const vt = p.vTable;
  const vr = p.vOverR;
  const ht = p.hTable;
  const tauMax = p.vTauMax;
  const vInv = p.vInvStep;
  const gSla = p.gSla;
  const cLo = p.hCmin;
  const hInv = p.hInvStep;
  for (let i = 0; i < nx; i++) {
    if (mask !== null && mask[maskOffset + i] === 0) continue;
    const dx = xs[i] - ex;
    const f = dx * sinAz + dy * cosAz;
    const rh2 = dx * dx + dyy;
    const base = i * nz;
    if (rh2 === 0) {
      // On the antenna's own vertical axis: the reference path handles the degenerate angles.
      for (let k = 0; k < nz; k++) acc[base + k] += percentAt(pe, xs[i], y, zs[k]);
      continue;
    }
    const irh2 = 1 / rh2;
    const cphi = f / Math.sqrt(rh2);
    if (cphi < cLo) {
      // Beyond φ_cap the total is at A_max whatever θ.
      if (rh2 >= R2_MIN) {
        for (let k = 0; k < nz; k++) {
          const dz2 = dz2s[k];
          const tau = dz2 * irh2;
          if (tau < tauMax) {
            const q = tau * vInv;
            const iv = q | 0;
            const b0 = vr[2 * iv + 1];
            acc[base + k] += cMin * (b0 + (q - iv) * (vr[2 * iv + 3] - b0)) * irh2;
          } else acc[base + k] += cMin / (rh2 + dz2);
        }
      } else {
        for (let k = 0; k < nz; k++) {
          let r2 = rh2 + dz2s[k];
          if (r2 < R2_MIN) r2 = R2_MIN;
          acc[base + k] += cMin / r2;
        }
      }
      continue;
    }
    let x = (cphi - cLo) * hInv;
    if (x > N_TABLE) x = N_TABLE;
    const ih = x | 0;
    const kh = kSph * (ht[ih] + (x - ih) * (ht[ih + 1] - ht[ih]));
    if (rh2 >= R2_MIN) {
      for (let k = 0; k < nz; k++) {
        const dz2 = dz2s[k];
        const tau = dz2 * irh2;
        if (tau < tauMax) {
          const q = tau * vInv;
          const iv = q | 0;
          const j2 = 2 * iv;
          const fr = q - iv;
          const a0 = vr[j2];
          const b0 = vr[j2 + 1];
          const va = a0 + fr * (vr[j2 + 2] - a0);
          const vb = b0 + fr * (vr[j2 + 3] - b0);
          acc[base + k] += Math.max(kh * va, cMin * vb) * irh2;
        } else {
          acc[base + k] += Math.max(kh * gSla, cMin) / (rh2 + dz2);
        }
      }
      continue;
    }
    for (let k = 0; k < nz; k++) {
      const dz2 = dz2s[k];
      let r2 = rh2 + dz2;
      if (r2 < R2_MIN) r2 = R2_MIN;
      // V(τ_max) = g_SLA, so clamping τ there is exact.
      const q = Math.min(dz2 * irh2, tauMax) * vInv;
      const iv = q | 0;
      const c = kh * (vt[iv] + (q - iv) * (vt[iv + 1] - vt[iv]));
      acc[base + k] += Math.max(c, cMin) / r2;
    }
  }
}

/** 3GPP pattern with tilt: the same tables, one square root and one division per sample. */
function row3gppTilted(
  pe: PreparedEmitter,
  xs: Float64Array,
  y: number,
  dzs: Float64Array,
  dz2s: Float64Array,
  acc: Float64Array,
  mask: Uint8Array | null,
  maskOffset: number,
): void {
  const nx = xs.length;
  const nz = dzs.length;
  const p = pe.pattern;
  const kSph = pe.kSph;
  const sinAz = pe.sinAz;
  const cosAz = pe.cosAz;
  const sinT = pe.sinT;
  const cosT = pe.cosT;
  const ex = pe.x;
  const dy = y - pe.y;
  const dyy = dy * dy;
  const gMin = expNeg(-p.am * DB_TO_NEPER);
  const cMin = kSph * gMin;
  const vt = p.vTable;
  const ht = p.hTable;
  const tauMax = p.vTauMax;
  const vInv = p.vInvStep;
  const gSla = p.gSla;
  const cLo = p.hCmin;
  const hInv = p.hInvStep;
  for (let i = 0; i < nx; i++) {
    if (mask !== null && mask[maskOffset + i] === 0) continue;
    const dx = xs[i] - ex;
    const f = dx * sinAz + dy * cosAz;
    const s = dx * cosAz - dy * sinAz;
    const ss = s * s;
    const rh2 = dx * dx + dyy;
    const fc = f * cosT;
    const fs = f * sinT;
    const base = i * nz;
    for (let k = 0; k < nz; k++) {
      const dz = dzs[k];
      let r2 = rh2 + dz2s[k];
      if (r2 < R2_MIN) r2 = R2_MIN;
      const f2 = fc - dz * sinT;
      const u = fs + dz * cosT;
      const rho2 = f2 * f2 + ss;
      if (rho2 > 0) {
        // One division gives both 1/ρ and 1/R².
        const rho = Math.sqrt(rho2);
        const inv = 1 / (rho * r2);
        const irho = inv * r2;
        const cphi = f2 * irho;
        if (cphi < cLo) {
          acc[base + k] += cMin * inv * rho;
          continue;
        }
        let x = (cphi - cLo) * hInv;
        if (x > N_TABLE) x = N_TABLE;
        const ih = x | 0;
        const gh = ht[ih] + (x - ih) * (ht[ih + 1] - ht[ih]);
        const tu = u * irho;
        const q = Math.min(tu * tu, tauMax) * vInv;
        const iv = q | 0;
        const gv = vt[iv] + (q - iv) * (vt[iv + 1] - vt[iv]);
        acc[base + k] += kSph * Math.max(gh * gv, gMin) * inv * rho;
        continue;
      }
      // On the antenna's own vertical axis (ρ = 0): φ = 0, θ = ±90° (or 0 at the antenna itself).
      acc[base + k] += (kSph * Math.max(u === 0 ? 1 : gSla, gMin)) / r2;
    }
  }
}

/** 3GPP pattern with a wide vertical beam (θ_SLA ≥ 80°): V read in cos θ = ρ/R. */
function row3gppWide(
  pe: PreparedEmitter,
  xs: Float64Array,
  y: number,
  dzs: Float64Array,
  dz2s: Float64Array,
  acc: Float64Array,
  mask: Uint8Array | null,
  maskOffset: number,
): void {
  const nx = xs.length;
  const nz = dzs.length;
  const p = pe.pattern;
  const kSph = pe.kSph;
  const sinAz = pe.sinAz;
  const cosAz = pe.cosAz;
  const sinT = pe.sinT;
  const cosT = pe.cosT;
  const ex = pe.x;
  const dy = y - pe.y;
  const dyy = dy * dy;
  const gMin = expNeg(-p.am * DB_TO_NEPER);
  const cMin = kSph * gMin;
  const ht = p.hTable;
  const vct = p.vcTable;
  const cLo = p.hCmin;
  const hInv = p.hInvStep;
  for (let i = 0; i < nx; i++) {
    if (mask !== null && mask[maskOffset + i] === 0) continue;
    const dx = xs[i] - ex;
    const f = dx * sinAz + dy * cosAz;
    const s = dx * cosAz - dy * sinAz;
    const ss = s * s;
    const rh2 = dx * dx + dyy;
    const fc = f * cosT;
    const fs = f * sinT;
    const base = i * nz;
    for (let k = 0; k < nz; k++) {
      const dz = dzs[k];
      let r2 = rh2 + dz2s[k];
      if (r2 < R2_MIN) r2 = R2_MIN;
      const f2 = fc - dz * sinT;
      const u = fs + dz * cosT;
      const rho2 = f2 * f2 + ss;
      if (rho2 > 0) {
        const rho = Math.sqrt(rho2);
        const inv = 1 / (rho * r2);
        const cphi = f2 * inv * r2;
        if (cphi < cLo) {
          acc[base + k] += cMin * inv * rho;
          continue;
        }
        let x = (cphi - cLo) * hInv;
        if (x > N_TABLE) x = N_TABLE;
        const ih = x | 0;
        const gh = ht[ih] + (x - ih) * (ht[ih + 1] - ht[ih]);
        let ct = rho2 * Math.sqrt(r2) * inv * N_TABLE;
        if (ct > N_TABLE) ct = N_TABLE;
        const iv = ct | 0;
        const gv = vct[iv] + (ct - iv) * (vct[iv + 1] - vct[iv]);
        acc[base + k] += kSph * Math.max(gh * gv, gMin) * inv * rho;
        continue;
      }
      // On the antenna's own vertical axis (ρ = 0): φ = 0, θ = ±90° (or 0 at the antenna itself).
      acc[base + k] += (kSph * Math.max(u === 0 ? 1 : vct[0], gMin)) / r2;
    }
  }
}

/** 3GPP pattern without tables (horizontal cap beyond 170°): fast atan and exp per sample. */
function row3gppDirect(
  pe: PreparedEmitter,
  xs: Float64Array,
  y: number,
  dzs: Float64Array,
  dz2s: Float64Array,
  acc: Float64Array,
  mask: Uint8Array | null,
  maskOffset: number,
): void {
  const nx = xs.length;
  const nz = dzs.length;
  const p = pe.pattern;
  const kSph = pe.kSph;
  const cH = p.cH;
  const kV = p.cV * DB_TO_NEPER;
  const am = p.am;
  const slaN = p.sla * DB_TO_NEPER;
  const amN = am * DB_TO_NEPER;
  const sinAz = pe.sinAz;
  const cosAz = pe.cosAz;
  const sinT = pe.sinT;
  const cosT = pe.cosT;
  const ex = pe.x;
  const dy = y - pe.y;
  const dyy = dy * dy;
  const cMin = kSph * expNeg(-amN);
  // |φ| ≥ φ_cap ⇔ 12(φ/φ3)² ≥ A_max: the horizontal term alone reaches the cap.
  const phiCap = Math.sqrt(am / cH);
  const cosPhiCap = phiCap >= Math.PI ? -2 : Math.cos(phiCap);
  for (let i = 0; i < nx; i++) {
    if (mask !== null && mask[maskOffset + i] === 0) continue;
    const dx = xs[i] - ex;
    const f = dx * sinAz + dy * cosAz;
    const s = dx * cosAz - dy * sinAz;
    const ss = s * s;
    const rh2 = dx * dx + dyy;
    const fc = f * cosT;
    const fs = f * sinT;
    const base = i * nz;
    for (let k = 0; k < nz; k++) {
      const dz = dzs[k];
      let r2 = rh2 + dz2s[k];
      if (r2 < R2_MIN) r2 = R2_MIN;
      const f2 = fc - dz * sinT;
      const rho = Math.sqrt(f2 * f2 + ss);
      if (f2 < rho * cosPhiCap) {
        acc[base + k] += cMin / r2;
        continue;
      }
      const u = fs + dz * cosT;
      const phi = absAtan2(s, f2);
      const th = absAtan2(u, rho);
      let ah = cH * phi * phi;
      if (ah > am) ah = am;
      let av = kV * th * th;
      if (av > slaN) av = slaN;
      let a = ah * DB_TO_NEPER + av;
      if (a > amN) a = amN;
      acc[base + k] += (kSph * expNeg(-a)) / r2;
    }
  }
}

const DEG = 180 / Math.PI;
const INV_STEP = 1 / TAB_STEP_DEG;
const F_INV_STEP = 1 / F_STEP_DEG;

/**
 * Spherical model with tabulated cuts (A = A_H(φ) + A_V(−θ), as attenuationTabulated)
 * or the F.1336 sectoral pattern (through the same tables as attenuationF1336),
 * with the fast atan and exp: no allocation, no search, no log/pow per sample.
 */
function accumulateRowTabulated(
  pe: PreparedEmitter,
  xs: Float64Array,
  y: number,
  zs: Float64Array,
  acc: Float64Array,
  mask: Uint8Array | null,
  maskOffset: number,
): void {
  const nx = xs.length;
  const nz = zs.length;
  const p = pe.pattern;
  const hr = p.hRes;
  const vr = p.vRes;
  const am = p.am;
  const kSph = pe.kSph;
  const sinAz = pe.sinAz;
  const cosAz = pe.cosAz;
  const sinT = pe.sinT;
  const cosT = pe.cosT;
  const dy = y - pe.y;
  const dyy = dy * dy;
  const f1336 = p.kind === PATTERN_F1336;
  for (let i = 0; i < nx; i++) {
    if (mask !== null && mask[maskOffset + i] === 0) continue;
    const dx = xs[i] - pe.x;
    const f = dx * sinAz + dy * cosAz;
    const s = dx * cosAz - dy * sinAz;
    const ss = s * s;
    const rh2 = dx * dx + dyy;
    const fc = f * cosT;
    const fs = f * sinT;
    const base = i * nz;
    for (let k = 0; k < nz; k++) {
      const dz = zs[k] - pe.z;
      let r2 = rh2 + dz * dz;
      if (r2 < R2_MIN) r2 = R2_MIN;
      const f2 = fc - dz * sinT;
      const u = fs + dz * cosT;
      const phiAbs = absAtan2(s, f2) * DEG;
      const thAbs = absAtan2(u, Math.sqrt(f2 * f2 + ss)) * DEG;
      let a: number;
      if (f1336) a = f1336FromTables(p, phiAbs * F_INV_STEP, thAbs * F_INV_STEP);
      else {
        // φ in [0°, 360°) clockwise, and the vertical-cut angle −θ in [0°, 360°).
        const ph = s < 0 ? 360 - phiAbs : phiAbs;
        const va = u > 0 ? 360 - thAbs : thAbs;
        const xh = (ph >= 360 ? 0 : ph) * INV_STEP;
        const ih = xh | 0;
        const xv = (va >= 360 ? 0 : va) * INV_STEP;
        const iv = xv | 0;
        a = hr[ih] + (xh - ih) * (hr[ih + 1] - hr[ih]) + vr[iv] + (xv - iv) * (vr[iv + 1] - vr[iv]);
        if (a > am) a = am;
      }
      acc[base + k] += (kSph * expNeg(-a * DB_TO_NEPER)) / r2;
    }
  }
}
