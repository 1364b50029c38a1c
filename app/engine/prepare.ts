/** Per-emitter constants, hoisted once per request (pure; plain data out). */
import { EngineInputError } from "./errors";
import { limitAt, type Limit, type StandardId, type Tier } from "./limits";
import {
  apertureEfficiency,
  apertureFarFieldStartM,
  apertureNearFieldExtentM,
  apertureNearFieldWm2,
  cylindricalCrossoverM,
} from "./models";
import { patternAttenuationDb, preparePattern, PATTERN_3GPP, PATTERN_F1336, PATTERN_TABULATED } from "./patterns";
import {
  MODEL_APERTURE,
  MODEL_AUTO,
  MODEL_CYLINDRICAL,
  MODEL_SPHERICAL,
  percentAt,
  type PreparedEmitter,
} from "./kernel";
import type { EmitterInput } from "./schema";
import { antennaInputPowerW, eirpToErp, eirpW, wavelengthM } from "./units";

const RAD = Math.PI / 180;
const MODELS: Record<EmitterInput["model"], number> = {
  spherical: MODEL_SPHERICAL,
  cylindrical: MODEL_CYLINDRICAL,
  auto: MODEL_AUTO,
  aperture: MODEL_APERTURE,
};

export interface EmitterSummary {
  id: string;
  inputPowerW: number;
  eirpW: number;
  erpW: number;
  limitWm2: number;
  limit: Omit<Limit, "standard" | "tier" | "frequencyMHz">;
}

/**
 * Hoist an emitter's constants for one standard and tier.
 * P = P_tx·10^(−loss/10); EIRP = P·10^(G/10); limits from limits.ts.
 */
export function prepareEmitter(
  e: EmitterInput,
  standard: StandardId,
  tier: Tier,
  index = 0,
): { prepared: PreparedEmitter; summary: EmitterSummary } {
  const lim = limitAt(standard, tier, e.frequencyMHz, `emitters[${index}].frequencyMHz`);
  const p = antennaInputPowerW(e.powerW, e.lossDb);
  const gain = 10 ** (e.gainDbi / 10);
  const eirp = eirpW(p, e.gainDbi);
  const duty = e.dutyFactor;
  const F = e.reflectionFactor;
  const S = lim.sWm2;
  const pattern = preparePattern(e.pattern);
  const az = e.azimuthDeg * RAD;
  const tilt = e.tiltDeg * RAD;
  const model = MODELS[e.model];
  const pe: PreparedEmitter = {
    id: e.id,
    x: e.position.x,
    y: e.position.y,
    z: e.position.z,
    sinAz: Math.sin(az),
    cosAz: Math.cos(az),
    sinT: e.tiltDeg === 0 ? 0 : Math.sin(tilt),
    cosT: e.tiltDeg === 0 ? 1 : Math.cos(tilt),
    model,
    pattern,
    kSph: (100 * duty * F * eirp) / (4 * Math.PI * S),
    kCyl: 0,
    halfH: 0,
    crossR: 0,
    halfBw: Math.PI,
    edgeAttDb: 0,
    rnf: 0,
    rff: 0,
    kNf: 0,
  };
  if (model === MODEL_CYLINDRICAL || model === MODEL_AUTO) {
    const h = e.apertureM as number;
    let bwDeg = e.hBeamwidthDeg;
    if (bwDeg === undefined) {
      bwDeg =
        pattern.kind === PATTERN_3GPP || pattern.kind === PATTERN_F1336 || pattern.kind === PATTERN_TABULATED
          ? pattern.h3 / RAD
          : 360;
    }
    if (!(bwDeg > 0)) throw new EngineInputError(`emitters[${index}].hBeamwidthDeg`, "no horizontal beamwidth");
    pe.halfH = h / 2;
    pe.kCyl = (100 * duty * (180 / bwDeg) * p) / (Math.PI * h * S);
    pe.crossR = cylindricalCrossoverM(gain, h, bwDeg, F);
    pe.halfBw = (bwDeg / 2) * RAD;
    pe.edgeAttDb = bwDeg >= 360 ? 0 : patternAttenuationDb(pattern, pe.halfBw, 0);
  } else if (model === MODEL_APERTURE) {
    const d = e.apertureM as number;
    const lambda = wavelengthM(e.frequencyMHz);
    pe.rnf = apertureNearFieldExtentM(d, lambda);
    pe.rff = apertureFarFieldStartM(d, lambda);
    pe.kNf = (100 * duty * apertureNearFieldWm2(p, d, apertureEfficiency(gain, d, lambda))) / S;
  }
  const { standard: _s, tier: _t, frequencyMHz: _f, ...limit } = lim;
  return {
    prepared: pe,
    summary: { id: e.id, inputPowerW: p, eirpW: eirp, erpW: eirpToErp(eirp), limitWm2: S, limit },
  };
}

/**
 * Compliance distance on boresight: the largest distance R along the
 * (tilted) boresight at which this emitter alone reaches 100 % of its limit.
 * Spherical: R = √(δ·F·EIRP·g₀/(4π·S_lim)) (OET-65 eq. (4) solved for R);
 * other models: the outermost 100 % crossing of the same percentAt profile,
 * found by a geometric scan inward then bisection. 0 when never reached.
 */
export function complianceDistanceM(pe: PreparedEmitter): number {
  const g0 = Math.exp((-patternAttenuationDb(pe.pattern, 0, 0) * Math.LN10) / 10);
  if (pe.model === MODEL_SPHERICAL) return Math.sqrt((pe.kSph * g0) / 100);
  const dx = pe.sinAz * pe.cosT;
  const dy = pe.cosAz * pe.cosT;
  const dz = -pe.sinT;
  const at = (r: number) => percentAt(pe, pe.x + r * dx, pe.y + r * dy, pe.z + r * dz);
  let hi = 4 * Math.max(Math.sqrt(pe.kSph / 100), pe.kCyl / 100, pe.rff, 1);
  for (let i = 0; i < 60 && at(hi) >= 100; i++) hi *= 2;
  let r = hi;
  let prev = hi;
  while (r > 1e-4 && at(r) < 100) {
    prev = r;
    r *= 0.98;
  }
  if (r <= 1e-4) return 0;
  let lo = r;
  let up = prev;
  for (let i = 0; i < 80; i++) {
    const mid = 0.5 * (lo + up);
    if (at(mid) >= 100) lo = mid;
    else up = mid;
  }
  return lo;
}
