import { describe, expect, it } from "vitest";
import {
  antennaInputPowerW,
  dbdToDbi,
  dbiToDbd,
  dbmToW,
  dbwToW,
  DIPOLE_GAIN_DBI,
  eirpToErp,
  eirpW,
  erpToEirp,
  ETA0,
  ETA0_HANDBOOK,
  eToH,
  eToS,
  hToE,
  hToS,
  mwcm2ToWm2,
  sToE,
  sToH,
  uwcm2ToWm2,
  wavelengthM,
  wm2ToMwcm2,
  wm2ToUwcm2,
  wToDbm,
  wToDbw,
} from "./units";

describe("power levels", () => {
  it("dBm and dBW: 30 dBm = 0 dBW = 1 W, 43 dBm ≈ 20 W", () => {
    expect(dbmToW(30)).toBe(1);
    expect(dbwToW(0)).toBe(1);
    expect(dbmToW(43)).toBeCloseTo(19.9526, 4);
    expect(wToDbm(20)).toBeCloseTo(43.0103, 4);
    expect(wToDbw(100)).toBeCloseTo(20, 12);
  });
  it("antenna input power P = P_tx·10^(−loss/10); EIRP = P·10^(G/10)", () => {
    expect(antennaInputPowerW(40, 3)).toBeCloseTo(20.0475, 4);
    expect(eirpW(20, 17)).toBeCloseTo(1002.3745, 4);
  });
});

describe("dipole reference (OET-65 §1: EIRP = 1.64·ERP; 2.15 dBi — from memory)", () => {
  it("half-wave dipole gain 2.15 dBi = 1.64 linear", () => {
    expect(DIPOLE_GAIN_DBI).toBe(2.15);
    expect(10 ** (DIPOLE_GAIN_DBI / 10)).toBeCloseTo(1.64, 2);
  });
  it("dBd ↔ dBi and ERP ↔ EIRP", () => {
    expect(dbdToDbi(10)).toBe(12.15);
    expect(dbiToDbd(17.15)).toBeCloseTo(15, 12);
    expect(erpToEirp(1000)).toBeCloseTo(1640.6, 1);
    expect(eirpToErp(erpToEirp(123))).toBeCloseTo(123, 12);
  });
});

describe("power density units", () => {
  it("1 mW/cm² = 10 W/m², 1 µW/cm² = 0.01 W/m²", () => {
    expect(mwcm2ToWm2(1)).toBe(10);
    expect(wm2ToMwcm2(10)).toBe(1);
    expect(uwcm2ToWm2(100)).toBe(1);
    expect(wm2ToUwcm2(0.5)).toBe(50);
  });
});

describe("plane wave (S = E²/η₀ = η₀H²)", () => {
  it("η₀ = µ₀c ≈ 376.73 Ω; handbooks use 377", () => {
    expect(ETA0).toBeCloseTo(4e-7 * Math.PI * 299_792_458, 3);
    expect(ETA0_HANDBOOK).toBe(377);
  });
  it("OET-65 eq. (2), from memory: S = E²/377 — 61.4 V/m ↔ 1 mW/cm² (the FCC occupational 30–300 MHz row)", () => {
    expect(wm2ToMwcm2(eToS(61.4, 377))).toBeCloseTo(1.0, 3);
    expect(wm2ToMwcm2(hToS(0.163, 377))).toBeCloseTo(1.0, 1);
    expect(eToS(27.5, 377)).toBeCloseTo(2.006, 3);
  });
  it("E ↔ H ↔ S round trips", () => {
    for (const s of [0.001, 1, 10, 1000]) {
      expect(eToS(sToE(s))).toBeCloseTo(s, 9);
      expect(hToS(sToH(s))).toBeCloseTo(s, 9);
      expect(eToH(sToE(s))).toBeCloseTo(sToH(s), 12);
      expect(hToE(sToH(s))).toBeCloseTo(sToE(s), 9);
    }
  });
  it("wavelength: λ = c/f, 300 MHz ≈ 0.9993 m", () => {
    expect(wavelengthM(300)).toBeCloseTo(0.99931, 5);
  });
});
