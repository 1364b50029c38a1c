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
import { absAtan2, atanPos, expNeg } from "./fastmath";
import {
  N_VTABLE,
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
 * Fast paths for the spherical model with isotropic and 3GPP patterns (the
 * horizontal part once per column, heights inside; atan skipped where the
 * pattern is capped); any other model/pattern goes through percentAt.
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
  const nx = xs.length;
  const nz = zs.length;
  const kind = pe.pattern.kind;
  if (pe.model !== MODEL_SPHERICAL || (kind !== PATTERN_ISOTROPIC && kind !== PATTERN_3GPP)) {
    for (let i = 0; i < nx; i++) {
      if (mask !== null && mask[maskOffset + i] === 0) continue;
      const x = xs[i];
      const base = i * nz;
      for (let k = 0; k < nz; k++) acc[base + k] += percentAt(pe, x, y, zs[k]);
    }
    return;
  }
  const dzs = scratch.dz;
  const dz2s = scratch.dz2;
  for (let k = 0; k < nz; k++) {
    const d = zs[k] - pe.z;
    dzs[k] = d;
    dz2s[k] = d * d;
  }
  const dy = y - pe.y;
  const dyy = dy * dy;
  const kSph = pe.kSph;
  if (kind === PATTERN_ISOTROPIC) {
    for (let i = 0; i < nx; i++) {
      if (mask !== null && mask[maskOffset + i] === 0) continue;
      const dx = xs[i] - pe.x;
      const rh2 = dx * dx + dyy;
      const base = i * nz;
      for (let k = 0; k < nz; k++) {
        let r2 = rh2 + dz2s[k];
        if (r2 < R2_MIN) r2 = R2_MIN;
        acc[base + k] += kSph / r2;
      }
    }
    return;
  }
  const p = pe.pattern;
  const cH = p.cH;
  const cV = p.cV;
  const am = p.am;
  const sla = p.sla;
  const sinAz = pe.sinAz;
  const cosAz = pe.cosAz;
  const cMin = kSph * expNeg(-am * DB_TO_NEPER);
  // |φ| ≥ φ_cap ⇔ 12(φ/φ3)² ≥ A_max: the horizontal term alone reaches the cap.
  const phiCap = Math.sqrt(am / cH);
  const cosPhiCap = phiCap >= Math.PI ? -2 : Math.cos(phiCap);
  const kV = cV * DB_TO_NEPER;
  const gMin = expNeg(-am * DB_TO_NEPER);
  const vt = p.vTable;
  const ht = p.hTable;
  const hCmin = p.hCmin;
  const hInv = p.hInvStep;
  const useTables = vt.length > 0 && ht.length > 0;
  const vTmax = p.vTmax;
  const vInv = p.vInvStep;
  const gSla = p.gSla;
  if (pe.sinT === 0) {
    // Tilt 0: φ and the horizontal distance do not depend on height.
    for (let i = 0; i < nx; i++) {
      if (mask !== null && mask[maskOffset + i] === 0) continue;
      const dx = xs[i] - pe.x;
      const f = dx * sinAz + dy * cosAz;
      const s = dx * cosAz - dy * sinAz;
      const rh2 = dx * dx + dyy;
      const rh = Math.sqrt(rh2);
      const base = i * nz;
      if (f < rh * cosPhiCap) {
        for (let k = 0; k < nz; k++) {
          let r2 = rh2 + dz2s[k];
          if (r2 < R2_MIN) r2 = R2_MIN;
          acc[base + k] += cMin / r2;
        }
        continue;
      }
      const invRh = rh > 0 ? 1 / rh : 1e300;
      if (useTables) {
        // g = max(H(cos φ)·V(tan θ), g_min): A = min(min(A_H, A_max) + min(A_V, SLA_V), A_max) in gain form.
        let gh = 1;
        if (rh > 0) {
          let w = (f * invRh - hCmin) * hInv;
          if (w > N_VTABLE) w = N_VTABLE;
          const i0 = w | 0;
          const h0 = ht[i0];
          gh = h0 + (w - i0) * (ht[i0 + 1] - h0);
        }
        for (let k = 0; k < nz; k++) {
          const dz = dzs[k];
          let r2 = rh2 + dz2s[k];
          if (r2 < R2_MIN) r2 = R2_MIN;
          const t = (dz < 0 ? -dz : dz) * invRh;
          let gv: number;
          if (t >= vTmax) gv = gSla;
          else {
            const u = t * vInv;
            const i0 = u | 0;
            const a0 = vt[i0];
            gv = a0 + (u - i0) * (vt[i0 + 1] - a0);
          }
          let g = gh * gv;
          if (g < gMin) g = gMin;
          acc[base + k] += (kSph * g) / r2;
        }
        continue;
      }
      const phi = absAtan2(s, f);
      let ah = cH * phi * phi;
      if (ah > am) ah = am;
      // The vertical term at which the total stops growing (SLA_V or the A_max cap).
      let capV = am - ah;
      if (capV > sla) capV = sla;
      const th2Cap = capV / cV;
      const cCap = kSph * expNeg(-(ah + capV) * DB_TO_NEPER);
      const cH0 = kSph * expNeg(-ah * DB_TO_NEPER);
      for (let k = 0; k < nz; k++) {
        const dz = dzs[k];
        let r2 = rh2 + dz2s[k];
        if (r2 < R2_MIN) r2 = R2_MIN;
        const th = atanPos((dz < 0 ? -dz : dz) * invRh);
        const th2 = th * th;
        acc[base + k] += (th2 >= th2Cap ? cCap : cH0 * expNeg(-kV * th2)) / r2;
      }
    }
    return;
  }
  const sinT = pe.sinT;
  const cosT = pe.cosT;
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
      if (useTables) {
        let gh = 1;
        let t = u === 0 ? 0 : Infinity; // on the antenna's own vertical axis (ρ = 0), as atan2 would give
        if (rho > 0) {
          const inv = 1 / rho;
          let w = (f2 * inv - hCmin) * hInv;
          if (w > N_VTABLE) w = N_VTABLE;
          const i0 = w | 0;
          const h0 = ht[i0];
          gh = h0 + (w - i0) * (ht[i0 + 1] - h0);
          t = (u < 0 ? -u : u) * inv;
        }
        let gv: number;
        if (t >= vTmax) gv = gSla;
        else {
          const w = t * vInv;
          const i0 = w | 0;
          const a0 = vt[i0];
          gv = a0 + (w - i0) * (vt[i0 + 1] - a0);
        }
        let g = gh * gv;
        if (g < gMin) g = gMin;
        acc[base + k] += (kSph * g) / r2;
        continue;
      }
      const phi = absAtan2(s, f2);
      let ah = cH * phi * phi;
      if (ah > am) ah = am;
      const th = absAtan2(u, rho);
      let av = cV * th * th;
      if (av > sla) av = sla;
      let a = ah + av;
      if (a > am) a = am;
      acc[base + k] += (kSph * expNeg(-a * DB_TO_NEPER)) / r2;
    }
  }
}
