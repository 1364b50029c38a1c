/**
 * Units and plane-wave relations.
 *
 * Power levels (W, dBm, dBW), gain references (dBi, dBd), EIRP and ERP,
 * power-density units (W/m², mW/cm², µW/cm²) and the far-field plane-wave
 * relations S = E²/η₀ = η₀·H² (IEEE Std 211 / any antenna handbook).
 */

/** Free-space wave impedance η₀ = µ₀·c ≈ 376.730 Ω (CODATA 2018). */
export const ETA0 = 376.730313668;
/** The rounded 377 Ω used by FCC OET Bulletin 65 and most handbooks. */
export const ETA0_HANDBOOK = 377;
/** Speed of light in vacuum, m/s (exact, SI). */
export const C0 = 299_792_458;
/** Gain of a half-wave dipole over isotropic: 2.15 dBi (OET-65 §1, "1.64"). */
export const DIPOLE_GAIN_DBI = 2.15;

/** dBm → W: P = 10^((dBm − 30)/10). */
export const dbmToW = (dbm: number): number => 10 ** ((dbm - 30) / 10);
/** W → dBm: 10·log10(P) + 30. */
export const wToDbm = (w: number): number => 10 * Math.log10(w) + 30;
/** dBW → W. */
export const dbwToW = (dbw: number): number => 10 ** (dbw / 10);
/** W → dBW. */
export const wToDbw = (w: number): number => 10 * Math.log10(w);
/** dB → linear power ratio. */
export const dbToRatio = (db: number): number => 10 ** (db / 10);
/** Linear power ratio → dB. */
export const ratioToDb = (r: number): number => 10 * Math.log10(r);

/** dBd → dBi: gain over a half-wave dipole plus 2.15 dB. */
export const dbdToDbi = (dbd: number): number => dbd + DIPOLE_GAIN_DBI;
/** dBi → dBd. */
export const dbiToDbd = (dbi: number): number => dbi - DIPOLE_GAIN_DBI;

/** Antenna input power P = P_tx·10^(−loss/10) (line and connector loss in dB). */
export const antennaInputPowerW = (powerW: number, lossDb = 0): number => powerW * 10 ** (-lossDb / 10);
/** EIRP = P·G (G linear from dBi). */
export const eirpW = (inputPowerW: number, gainDbi: number): number => inputPowerW * 10 ** (gainDbi / 10);
/** ERP = EIRP / 1.64 (EIRP referred to a half-wave dipole, OET-65 §1). */
export const eirpToErp = (eirp: number): number => eirp / 10 ** (DIPOLE_GAIN_DBI / 10);
/** EIRP = 1.64·ERP. */
export const erpToEirp = (erp: number): number => erp * 10 ** (DIPOLE_GAIN_DBI / 10);

/** 1 mW/cm² = 10 W/m². */
export const wm2ToMwcm2 = (s: number): number => s / 10;
export const mwcm2ToWm2 = (s: number): number => s * 10;
/** 1 µW/cm² = 0.01 W/m². */
export const wm2ToUwcm2 = (s: number): number => s * 100;
export const uwcm2ToWm2 = (s: number): number => s / 100;

/** Plane wave: S = E²/η (W/m² from V/m). */
export const eToS = (eVm: number, eta = ETA0): number => (eVm * eVm) / eta;
/** Plane wave: E = √(η·S). */
export const sToE = (sWm2: number, eta = ETA0): number => Math.sqrt(eta * sWm2);
/** Plane wave: S = η·H² (W/m² from A/m). */
export const hToS = (hAm: number, eta = ETA0): number => eta * hAm * hAm;
/** Plane wave: H = √(S/η). */
export const sToH = (sWm2: number, eta = ETA0): number => Math.sqrt(sWm2 / eta);
/** Plane wave: H = E/η. */
export const eToH = (eVm: number, eta = ETA0): number => eVm / eta;
/** Plane wave: E = η·H. */
export const hToE = (hAm: number, eta = ETA0): number => hAm * eta;

/** Free-space wavelength λ = c/f, metres from MHz. */
export const wavelengthM = (frequencyMHz: number): number => C0 / (frequencyMHz * 1e6);
