// The inventory → engine conversion, each relation checked by hand.
import { describe, expect, it } from "vitest";
import { antennaInputPowerW, dbdToDbi, dbmToW, eirpToErp, eirpW, evaluate } from "~/engine";
import { engineEmitter, engineEmitters, emitterPattern, timeAveragingFactor, type InventoryEmitter } from "./engine-inputs";

const base: InventoryEmitter = {
  id: "row-1", label: "A1", frequencyMHz: 1960, powerPerCarrierW: 30, carriers: 4, lossDb: 1.5, gainDbi: 17.8,
  patternId: null, pattern: null, hBeamwidthDeg: 65, vBeamwidthDeg: 6, azimuthDeg: 20, mechanicalTiltDeg: 2, electricalTiltDeg: 4,
  x: 1, y: 2, z: 6, model: null, apertureM: 1.8, dishDiameterM: null, dutyFactor: 1, actualMaxFactor: 1, tddFactor: 1, active: true,
};
const options = { reflectionFactor: 1, defaultModel: "spherical" as const };
const none = new Map();

describe("inventory → engine", () => {
  it("sums the carriers and adds mechanical and electrical downtilt", () => {
    const e = engineEmitter(base, "A1", none, options);
    expect(e.powerW).toBe(120); // 4 carriers × 30 W
    expect(e.tiltDeg).toBe(6); // total tilt = mechanical + electrical (common practice, no source)
    expect(e.position).toEqual({ x: 1, y: 2, z: 6 });
  });

  it("gives the EIRP the engine reports: P·10^(−L/10)·10^(G/10) (FCC OET Bulletin 65 eq. (2), EIRP = P·G)", () => {
    const request = { standard: "fcc", tier: "general", emitters: [engineEmitter(base, "A1", none, options)], points: [{ x: 50, y: 50, z: 0 }] } as const;
    const response = evaluate(request);
    const byHand = 120 * 10 ** (-1.5 / 10) * 10 ** (17.8 / 10); // 4262.2 W
    expect(response.emitters[0].eirpW).toBeCloseTo(byHand, 2);
    expect(response.emitters[0].eirpW).toBeCloseTo(eirpW(antennaInputPowerW(120, 1.5), 17.8), 6);
    // ERP = EIRP / 1.64 (OET Bulletin 65: EIRP = 1.64 ERP, the half-wave dipole's gain; the engine uses 10^0.215 = 1.6406).
    expect(response.emitters[0].erpW / (byHand / 1.64)).toBeCloseTo(1, 3);
    expect(eirpToErp(byHand)).toBeCloseTo(byHand / 10 ** 0.215, 9);
  });

  it("takes the gain entered in dBd as dBi + 2.15 and power entered in dBm as W (stored so by the inventory)", () => {
    // dBd = dBi − 2.15 (half-wave dipole gain 2.15 dBi, OET Bulletin 65); P(W) = 10^((dBm − 30)/10).
    expect(dbdToDbi(13)).toBeCloseTo(15.15, 12);
    expect(dbmToW(43)).toBeCloseTo(19.953, 3);
    expect(dbmToW(30)).toBeCloseTo(1, 12);
  });

  it("averages time by duty × F_PR × F_TDD (IEC 62232 actual-maximum approach: P_avg = F_PR · F_TDD · P_max)", () => {
    const e = { ...base, dutyFactor: 0.9, actualMaxFactor: 0.25, tddFactor: 0.75 };
    expect(timeAveragingFactor(e)).toBeCloseTo(0.16875, 12);
    expect(engineEmitter(e, "A1", none, options).dutyFactor).toBeCloseTo(0.16875, 12);
  });

  it("uses the library pattern, else the emitter's own, else 3GPP TR 38.901 from its beamwidths, else isotropic", () => {
    const tab = { type: "tabulated" as const, horizontal: [{ angleDeg: 0, attenuationDb: 0 }], vertical: [{ angleDeg: 0, attenuationDb: 0 }] };
    expect(emitterPattern({ ...base, patternId: "p1" }, new Map([["p1", tab]]))).toBe(tab);
    const own = { type: "itu-r-f.1336-sectoral" as const, hBeamwidthDeg: 65, vBeamwidthDeg: 8 };
    expect(emitterPattern({ ...base, pattern: own }, none)).toBe(own);
    expect(emitterPattern(base, none)).toEqual({ type: "3gpp-38.901", hBeamwidthDeg: 65, vBeamwidthDeg: 6, maxAttenuationDb: 30, sideLobeDb: 30 });
    expect(emitterPattern({ ...base, hBeamwidthDeg: null, vBeamwidthDeg: null }, none)).toBe("isotropic");
    expect(() => emitterPattern({ ...base, patternId: "gone" }, none)).toThrow(/not in the library/);
  });

  it("applies the default model when the emitter sets none, the dish diameter for the aperture model, and falls back to spherical without a size", () => {
    expect(engineEmitter(base, "A1", none, { ...options, defaultModel: "auto" })).toMatchObject({ model: "auto", apertureM: 1.8, hBeamwidthDeg: 65 });
    expect(engineEmitter({ ...base, model: "cylindrical" }, "A1", none, options)).toMatchObject({ model: "cylindrical", apertureM: 1.8 });
    expect(engineEmitter({ ...base, model: "aperture", dishDiameterM: 0.6 }, "A1", none, options)).toMatchObject({ model: "aperture", apertureM: 0.6 });
    const bare = engineEmitter({ ...base, model: "cylindrical", apertureM: null }, "A1", none, options);
    expect(bare.model).toBe("spherical");
    expect(bare).not.toHaveProperty("apertureM");
  });

  it("passes the reflection factor through", () => {
    expect(engineEmitter(base, "A1", none, { ...options, reflectionFactor: 2.56 }).reflectionFactor).toBe(2.56);
  });

  it("leaves inactive emitters out and keeps ids unique", () => {
    const { emitters, inventoryIdOf } = engineEmitters(
      [base, { ...base, id: "row-2" }, { ...base, id: "row-3", label: "B1", active: false }],
      none,
      options,
    );
    expect(emitters.map((e) => e.id)).toEqual(["A1", "A1 (2)"]);
    expect(inventoryIdOf.get("A1 (2)")).toBe("row-2");
  });
});
