/**
 * 47 CFR §1.1307(b)(3)(i)(C) thresholds. Values from memory (REFERENCES.md);
 * a third-party transcription of FCC 19-126 Table 2 (zimolzak/fcc-rf-formulas,
 * fcc.py) agrees on 1 920 R², 3.83 R², 0.0128 R²f and 19.2 R² and has
 * "33 450 R²/f²" for 1.34–30 MHz, which its author flags as doubtful; the
 * derivation S_lim·πR²/1.64 (1 800/f² W/m² × π/1.64 = 3 448/f²) supports 3 450.
 */
import { describe, expect, it } from "vitest";
import { EngineInputError } from "./errors";
import { exemptionMinDistanceM, fccExemptionThresholdErpW, fccMpeExemption } from "./exemption";
import { evaluate } from "./evaluate";
import { limitAt } from "./limits";

describe("§1.1307(b)(3)(i)(C) threshold ERP", () => {
  it.each([
    [0.5, 100, 1920 * 100 ** 2],
    [1.34, 100, 1920 * 100 ** 2],
    [10, 10, (3450 * 100) / 100],
    [30, 10, (3450 * 100) / 900],
    [100, 10, 3.83 * 100],
    [300, 10, 3.83 * 100],
    [800, 2, 0.0128 * 4 * 800],
    [1500, 2, 0.0128 * 4 * 1500],
    [1900, 5, 19.2 * 25],
    [100_000, 1, 19.2],
  ])("f = %s MHz, R = %s m → %s W", (f, r, w) => {
    expect(fccExemptionThresholdErpW(f, r)).toBeCloseTo(w, 9);
  });

  it("each threshold is S_lim(general)·πR²/1.64 (a reflection factor of 4) within the table's rounding", () => {
    for (const f of [0.5, 5, 20, 100, 700, 1000, 2500, 30_000]) {
      const derived = (limitAt("fcc", "general", f).sWm2 * Math.PI * 100) / 1.64;
      expect(Math.abs(fccExemptionThresholdErpW(f, 10) - derived) / derived).toBeLessThan(0.005);
    }
  });

  it("is an error outside 0.3 MHz–100 GHz", () => {
    expect(() => fccExemptionThresholdErpW(0.2, 10)).toThrow(EngineInputError);
    expect(() => fccExemptionThresholdErpW(100_001, 10)).toThrow(EngineInputError);
  });
});

describe("screening a single source", () => {
  it("λ/2π ≈ 47.7/f m", () => {
    expect(exemptionMinDistanceM(1)).toBeCloseTo(47.71, 2);
    expect(exemptionMinDistanceM(100)).toBeCloseTo(0.4771, 4);
  });
  it("exempt when R ≥ λ/2π and ERP ≤ threshold", () => {
    const r = fccMpeExemption({ frequencyMHz: 1900, erpW: 400, distanceM: 5 });
    expect(r.applicable).toBe(true);
    expect(r.thresholdErpW).toBeCloseTo(480, 9);
    expect(r.exempt).toBe(true);
    expect(fccMpeExemption({ frequencyMHz: 1900, erpW: 480, distanceM: 5 }).exempt).toBe(true);
    expect(fccMpeExemption({ frequencyMHz: 1900, erpW: 481, distanceM: 5 }).exempt).toBe(false);
  });
  it("not applicable (never exempt) closer than λ/2π: 10 MHz at 3 m (λ/2π = 4.77 m)", () => {
    const r = fccMpeExemption({ frequencyMHz: 10, erpW: 0.001, distanceM: 3 });
    expect(r.applicable).toBe(false);
    expect(r.exempt).toBe(false);
    expect(r.reason).toMatch(/λ\/2π/);
    expect(fccMpeExemption({ frequencyMHz: 10, erpW: 0.001, distanceM: 4.8 }).exempt).toBe(true);
  });
  it("rejects a non-positive distance", () => {
    expect(() => fccMpeExemption({ frequencyMHz: 10, erpW: 1, distanceM: 0 })).toThrow(EngineInputError);
  });
});

describe("screening in a request", () => {
  it("screens each emitter alone at the given distance, with its time-averaged ERP", () => {
    const r = evaluate({
      standard: "fcc",
      tier: "general",
      emitters: [
        { id: "a", frequencyMHz: 1900, powerW: 100, gainDbi: 2.15, position: { x: 0, y: 0, z: 0 } },
        { id: "b", frequencyMHz: 100, powerW: 1000, gainDbi: 2.15, dutyFactor: 0.5, position: { x: 0, y: 0, z: 0 } },
      ],
      points: [{ x: 1, y: 0, z: 0 }],
      screening: { distanceM: 5 },
    });
    const [a, b] = r.emitters.map((e) => e.exemption!);
    expect(a.erpW).toBeCloseTo(100, 9); // 2.15 dBi: ERP = P
    expect(a.thresholdErpW).toBeCloseTo(480, 9);
    expect(a.exempt).toBe(true);
    expect(b.erpW).toBeCloseTo(500, 9);
    expect(b.thresholdErpW).toBeCloseTo(3.83 * 25, 9);
    expect(b.exempt).toBe(false);
  });
});
