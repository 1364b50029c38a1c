import { describe, expect, it } from "vitest";
import { emitterEirp } from "./json";
import { formDefaults, gainFromDbi, gainToDbi, powerFromW, powerToW, valuesFromForm } from "./convert";
import { emitterFormSchema } from "./schemas";

describe("power and gain units", () => {
  // dBm is power relative to 1 mW: P[dBm] = 10·log10(P / 1 mW) (ITU-R V.574-5, "Use of the decibel
  // and the neper in telecommunications", §4, dBm = power level relative to 1 mW; from memory).
  it.each([
    [30, 1],
    [40, 10],
    [43, 19.952623149688797],
    [46, 39.810717055349734],
    [0, 0.001],
  ])("%s dBm is %s W", (dbm, w) => {
    expect(powerToW(dbm, "dBm")).toBeCloseTo(w, 12);
    expect(powerFromW(w, "dBm")).toBeCloseTo(dbm, 12);
  });

  it("keeps W as typed", () => {
    expect(powerToW(20, "W")).toBe(20);
  });

  // A half-wave dipole has a gain of 1.64 = 2.15 dBi, so dBi = dBd + 2.15 (FCC OET Bulletin 65,
  // Edition 97-01, §1 "EIRP = 1.64 × ERP"; REFERENCES.md "Formulas").
  it.each([
    [0, 2.15],
    [15.85, 18],
    [-2.15, 0],
  ])("%s dBd is %s dBi", (dbd, dbi) => {
    expect(gainToDbi(dbd, "dBd")).toBeCloseTo(dbi, 12);
    expect(gainFromDbi(dbi, "dBd")).toBeCloseTo(dbd, 12);
  });

  // EIRP = P·G and ERP = EIRP/1.64 (OET-65 §1): 20 W into 18 dBi (63.1) with 3 dB loss (½).
  it("computes EIRP and ERP with the engine's unit functions", () => {
    const { eirpW, erpW } = emitterEirp({ powerPerCarrierW: 10, carriers: 2, lossDb: 3, gainDbi: 18 });
    expect(eirpW).toBeCloseTo(20 * 10 ** -0.3 * 10 ** 1.8, 9);
    expect(eirpW / erpW).toBeCloseTo(10 ** 0.215, 12);
    expect(eirpW / erpW).toBeCloseTo(1.64, 2);
  });
});

describe("the row form", () => {
  const base = { label: "A1", frequencyMHz: "739", power: "46", powerUnit: "dBm", gain: "15.85", gainUnit: "dBd", x: "1", y: "2", z: "3", active: "on", patternChoice: "3gpp-38.901", hBeamwidthDeg: "65", vBeamwidthDeg: "7" };

  it("stores W and dBi, keeping the units typed, and draws the parametric pattern from the beamwidths", () => {
    const parsed = emitterFormSchema.safeParse(Object.fromEntries(Object.entries(base).map(([k, v]) => [k, /^-?[\d.]+$/.test(v) ? Number(v) : v])));
    expect(parsed.success).toBe(true);
    const values = valuesFromForm(parsed.data!);
    expect(values.powerPerCarrierW).toBeCloseTo(39.810717055349734, 12);
    expect(values.powerUnit).toBe("dBm");
    expect(values.gainDbi).toBeCloseTo(18, 12);
    expect(values.pattern).toEqual({ type: "3gpp-38.901", hBeamwidthDeg: 65, vBeamwidthDeg: 7, maxAttenuationDb: 30, sideLobeDb: 30 });
    const back = formDefaults(values);
    expect(back.power).toBe("46");
    expect(back.gain).toBe("15.85");
    expect(back.patternChoice).toBe("3gpp-38.901");
  });

  it("asks for the aperture of the cylindrical model and refuses a total tilt past 90°", () => {
    const parsed = emitterFormSchema.safeParse({ label: "A1", frequencyMHz: 739, power: 20, gain: 15, x: 0, y: 0, z: 0, model: "cylindrical", mechanicalTiltDeg: 60, electricalTiltDeg: 40 });
    expect(parsed.success).toBe(false);
    const paths = parsed.error!.issues.map((i) => i.path.join("."));
    expect(paths).toContain("apertureM");
    expect(paths).toContain("electricalTiltDeg");
  });
});
