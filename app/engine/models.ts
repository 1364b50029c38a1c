/**
 * Field-prediction formulas, one per function, in SI units (W, m, W/m²).
 * Sources: FCC OET Bulletin 65, Edition 97-01 (Section 2, "Prediction
 * methods"), and IEC 62232 (simplified cylindrical and spherical models).
 */

/** OET-65 eq. (3)/(4): far-field S = F·EIRP/(4πR²), F the power reflection factor (1, 2.56 or 4). */
export const sphericalWm2 = (eirpW: number, rM: number, reflectionFactor = 1): number =>
  (reflectionFactor * eirpW) / (4 * Math.PI * rM * rM);

/** OET-65 ground-reflection factor: field ×1.6, power ×1.6² = 2.56 (eq. (6)). */
export const OET65_REFLECTION = 2.56;
/** Full in-phase reflection: field ×2, power ×4 (used by 47 CFR §1.1307(b)(3)(i)(C)). */
export const FULL_REFLECTION = 4;

/**
 * OET-65 eq. (10), ERP form with the 2.56 ground reflection:
 * S(µW/cm²) = 2.56·1.64·100·ERP/(4πR²) ≈ 33.4·ERP(W)/R(m)².
 */
export const oet65ErpUwcm2 = (erpW: number, rM: number): number =>
  (OET65_REFLECTION * 1.64 * 100 * erpW) / (4 * Math.PI * rM * rM);

/**
 * OET-65 eqs. (13)–(14) / IEC 62232 cylindrical near-field model:
 * S = (180/θ_BW)·P/(π·R·h), θ_BW the horizontal half-power beamwidth in degrees
 * (360 for an omnidirectional array, giving P/(2πRh)), P the antenna input
 * power, h the aperture height, R the horizontal distance. Valid within the
 * aperture's vertical extent.
 */
export const cylindricalWm2 = (inputPowerW: number, rM: number, apertureHeightM: number, hBeamwidthDeg = 360): number =>
  ((180 / hBeamwidthDeg) * inputPowerW) / (Math.PI * rM * apertureHeightM);

/**
 * The distance where the cylindrical and spherical models agree:
 * (180/θ)·P/(πRh) = F·G·P/(4πR²) ⇒ R* = F·G·θ·h/720 (G linear). Inside R* the
 * cylindrical model is the lower (near-field) estimate, beyond it the spherical.
 */
export const cylindricalCrossoverM = (
  gainLinear: number,
  apertureHeightM: number,
  hBeamwidthDeg = 360,
  reflectionFactor = 1,
): number => (reflectionFactor * gainLinear * hBeamwidthDeg * apertureHeightM) / 720;

/** OET-65 eq. (11): extent of the near field of an aperture antenna, R_nf = D²/(4λ). */
export const apertureNearFieldExtentM = (diameterM: number, wavelengthM: number): number =>
  (diameterM * diameterM) / (4 * wavelengthM);

/** OET-65 eq. (16): start of the far field of an aperture antenna, R_ff = 0.6·D²/λ. */
export const apertureFarFieldStartM = (diameterM: number, wavelengthM: number): number =>
  (0.6 * diameterM * diameterM) / wavelengthM;

/** OET-65 eq. (12): maximum on-axis near-field power density S_nf = 16ηP/(πD²). */
export const apertureNearFieldWm2 = (inputPowerW: number, diameterM: number, efficiency: number): number =>
  (16 * efficiency * inputPowerW) / (Math.PI * diameterM * diameterM);

/** OET-65 eq. (15): transition region S_t = S_nf·R_nf/R (falls as 1/R). */
export const apertureTransitionWm2 = (nearFieldWm2: number, nearFieldExtentM: number, rM: number): number =>
  (nearFieldWm2 * nearFieldExtentM) / rM;

/** Aperture efficiency from gain: G = η(πD/λ)² ⇒ η = G·λ²/(πD)², clamped to (0, 1]. */
export const apertureEfficiency = (gainLinear: number, diameterM: number, wavelengthM: number): number => {
  const eta = (gainLinear * wavelengthM * wavelengthM) / (Math.PI * diameterM) ** 2;
  return eta > 1 ? 1 : eta;
};

/**
 * On-axis power density of an aperture antenna at distance R, OET-65 §2:
 * near field (R ≤ D²/4λ) S_nf; transition (R_nf < R < 0.6D²/λ) S_nf·R_nf/R;
 * far field F·EIRP/(4πR²). (At 0.6D²/λ the transition value is 3 % below the
 * far-field value for any η, so the step there is small and upward.)
 */
export function apertureOnAxisWm2(
  inputPowerW: number,
  gainLinear: number,
  diameterM: number,
  wavelengthM: number,
  rM: number,
  efficiency = apertureEfficiency(gainLinear, diameterM, wavelengthM),
  reflectionFactor = 1,
): number {
  const rnf = apertureNearFieldExtentM(diameterM, wavelengthM);
  const rff = apertureFarFieldStartM(diameterM, wavelengthM);
  const snf = apertureNearFieldWm2(inputPowerW, diameterM, efficiency);
  if (rM >= rff) return sphericalWm2(inputPowerW * gainLinear, rM, reflectionFactor);
  if (rM <= rnf) return snf;
  return apertureTransitionWm2(snf, rnf, rM);
}
