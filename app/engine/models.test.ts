/**
 * FCC OET Bulletin 65 (Edition 97-01) Section 2 prediction formulas and
 * IEC 62232 simplified models — all from memory (the bulletin's text was not
 * found in a readable form with the search tool).
 */
import { describe, expect, it } from "vitest";
import { evaluate } from "./evaluate";
import {
  apertureEfficiency,
  apertureFarFieldStartM,
  apertureNearFieldExtentM,
  apertureNearFieldWm2,
  apertureOnAxisWm2,
  apertureTransitionWm2,
  cylindricalCrossoverM,
  cylindricalWm2,
  OET65_REFLECTION,
  oet65ErpUwcm2,
  sphericalWm2,
} from "./models";
import { wavelengthM } from "./units";
import type { EvaluationRequestInput } from "./schema";

describe("far field (OET-65 eqs. (3)–(6))", () => {
  it("S = EIRP/(4πR²): 100 W EIRP at 10 m = 0.0796 W/m²", () => {
    expect(sphericalWm2(100, 10)).toBeCloseTo(100 / (4 * Math.PI * 100), 15);
    expect(sphericalWm2(100, 10)).toBeCloseTo(0.0795775, 7);
  });
  it("ground reflection: field ×1.6 ⇒ power ×2.56", () => {
    expect(OET65_REFLECTION).toBeCloseTo(1.6 ** 2, 12);
    expect(sphericalWm2(100, 10, OET65_REFLECTION)).toBeCloseTo(2.56 * 0.0795775, 6);
  });
  it("ERP form with reflection: S(µW/cm²) ≈ 33.4·ERP/R² (OET-65 eq. (10))", () => {
    expect(oet65ErpUwcm2(1000, 100)).toBeCloseTo(3.34, 2);
    expect(Math.abs(oet65ErpUwcm2(1, 1) - 33.4) / 33.4).toBeLessThan(0.001);
  });
});

describe("cylindrical near-field model (OET-65 eqs. (13)–(14), IEC 62232)", () => {
  it("omnidirectional: S = P/(2πRh); 100 W, h = 2 m, R = 5 m → 1.5915 W/m²", () => {
    expect(cylindricalWm2(100, 5, 2)).toBeCloseTo(100 / (2 * Math.PI * 5 * 2), 12);
    expect(cylindricalWm2(100, 5, 2)).toBeCloseTo(1.59155, 5);
  });
  it("sector: S = (180/θ)·P/(πRh); θ = 65° → 8.8147 W/m² at the same point", () => {
    expect(cylindricalWm2(100, 5, 2, 65)).toBeCloseTo(((180 / 65) * 100) / (Math.PI * 5 * 2), 12);
    expect(cylindricalWm2(100, 5, 2, 65)).toBeCloseTo(8.8147, 4);
  });
  it("the two models agree at R* = F·G·θ·h/720", () => {
    const g = 10 ** 1.5;
    for (const bw of [360, 90, 65]) {
      const r = cylindricalCrossoverM(g, 2, bw, 1);
      expect(cylindricalWm2(100, r, 2, bw)).toBeCloseTo(sphericalWm2(100 * g, r), 9);
    }
  });
});

describe("aperture (dish) antenna (OET-65 eqs. (11)–(16))", () => {
  // D = 1.2 m at 11 GHz, P = 10 W, η = 0.55.
  const lambda = wavelengthM(11_000);
  const rnf = apertureNearFieldExtentM(1.2, lambda);
  const rff = apertureFarFieldStartM(1.2, lambda);
  const snf = apertureNearFieldWm2(10, 1.2, 0.55);
  const g = 0.55 * ((Math.PI * 1.2) / lambda) ** 2;
  it("near-field extent D²/(4λ) = 13.209 m, far field from 0.6·D²/λ = 31.702 m", () => {
    expect(rnf).toBeCloseTo(13.2091, 3);
    expect(rff).toBeCloseTo(31.7019, 3);
  });
  it("on-axis near field S_nf = 16ηP/(πD²) = 19.452 W/m²", () => {
    expect(snf).toBeCloseTo(19.4523, 3);
  });
  it("transition region S_t = S_nf·R_nf/R (20 m → 12.847 W/m²); far field EIRP/(4πR²)", () => {
    // By hand: 19.4523 × 13.2091 / 20 = 12.847; G = 0.55(π·1.2/λ)² = 10 523.7, 10·G/(4π·50²) = 3.3498 W/m².
    expect(apertureTransitionWm2(snf, rnf, 20)).toBeCloseTo(12.847, 2);
    expect(apertureOnAxisWm2(10, g, 1.2, lambda, 5, 0.55)).toBeCloseTo(19.4523, 3);
    expect(apertureOnAxisWm2(10, g, 1.2, lambda, 20, 0.55)).toBeCloseTo(12.847, 2);
    expect(g).toBeCloseTo(10_523.7, 0);
    expect(apertureOnAxisWm2(10, g, 1.2, lambda, 50, 0.55)).toBeCloseTo(3.3498, 3);
  });
  it("efficiency from gain: G = η(πD/λ)² ⇒ η = Gλ²/(πD)²", () => {
    expect(apertureEfficiency(g, 1.2, lambda)).toBeCloseTo(0.55, 12);
  });
});

describe("worked multi-emitter example (FCC general population), by hand", () => {
  // Emitter A: 1900 MHz, 40 W, no loss, 15 dBi, isotropic, at (0, 0, 10).
  //   EIRP = 40 × 10^1.5 = 1264.911 W; limit (1500–100 000 MHz) = 1.0 mW/cm² = 10 W/m².
  //   Point (6, 8, 10): R = √(36 + 64 + 0) = 10 m; S = 1264.911/(4π·100) = 1.006584 W/m² → 10.06584 %.
  // Emitter B: 850 MHz, 20 W, 3 dB loss, 10 dBi, isotropic, at (6, 8, 2).
  //   P = 20 × 10^−0.3 = 10.02374 W; EIRP = 100.2374 W; limit f/1500 mW/cm² = 850/150 = 5.666667 W/m².
  //   Same point: R = 8 m; S = 100.2374/(4π·64) = 0.1246350 W/m² → 0.1246350/5.666667 = 2.199442 %.
  // Total = 10.06584 + 2.199442 = 12.26528 % (sum of fractions of each emitter's own limit).
  const req: EvaluationRequestInput = {
    standard: "fcc",
    tier: "general",
    emitters: [
      { id: "A", frequencyMHz: 1900, powerW: 40, gainDbi: 15, position: { x: 0, y: 0, z: 10 } },
      { id: "B", frequencyMHz: 850, powerW: 20, lossDb: 3, gainDbi: 10, position: { x: 6, y: 8, z: 2 } },
    ],
    points: [{ x: 6, y: 8, z: 10 }],
  };
  const r = evaluate(req);
  it("per-emitter EIRP and limits", () => {
    expect(r.emitters[0].eirpW).toBeCloseTo(1264.911, 3);
    expect(r.emitters[1].eirpW).toBeCloseTo(100.2374, 4);
    expect(r.emitters[0].limitWm2).toBe(10);
    expect(r.emitters[1].limitWm2).toBeCloseTo(5.666667, 6);
  });
  it("contributions and total", () => {
    const p = r.points![0];
    expect(p.contributions[0].powerDensityWm2).toBeCloseTo(1.006584, 6);
    expect(p.contributions[0].percent).toBeCloseTo(10.06584, 5);
    expect(p.contributions[1].powerDensityWm2).toBeCloseTo(0.124635, 6);
    expect(p.contributions[1].percent).toBeCloseTo(2.199442, 6);
    expect(p.totalPercent).toBeCloseTo(12.26528, 5);
  });
  it("compliance distances on boresight: R = √(EIRP/(4π·S_lim))", () => {
    expect(r.emitters[0].complianceDistanceM).toBeCloseTo(Math.sqrt(1264.911 / (4 * Math.PI * 10)), 5);
    expect(r.emitters[0].complianceDistanceM).toBeCloseTo(3.17267, 4);
    expect(r.emitters[1].complianceDistanceM).toBeCloseTo(Math.sqrt(100.2374 / (4 * Math.PI * 5.666667)), 5);
  });
});

describe("compliance distances by model", () => {
  const base = { frequencyMHz: 1900, position: { x: 0, y: 0, z: 0 } } as const;
  const run = (e: Record<string, unknown>) =>
    evaluate({ standard: "fcc", tier: "general", emitters: [{ id: "e", ...base, ...e }], points: [{ x: 1, y: 1, z: 0 }] })
      .emitters[0].complianceDistanceM;
  it("spherical with OET-65 reflection: R = √(2.56·EIRP/(4π·S)) = 1.6 × the free-space distance", () => {
    expect(run({ powerW: 1000, gainDbi: 0, reflectionFactor: 2.56 })).toBeCloseTo(1.6 * Math.sqrt(1000 / (40 * Math.PI)), 9);
  });
  it("duty factor scales power: R ∝ √δ", () => {
    expect(run({ powerW: 1000, gainDbi: 0, dutyFactor: 0.25 })).toBeCloseTo(0.5 * Math.sqrt(1000 / (40 * Math.PI)), 9);
  });
  it("cylindrical omni: R = P/(2π·h·S_lim) = 100/(2π·2·10) = 0.7958 m", () => {
    expect(run({ powerW: 100, gainDbi: 10, model: "cylindrical", apertureM: 2 })).toBeCloseTo(100 / (2 * Math.PI * 2 * 10), 6);
  });
  it("auto: cylindrical inside R* = G·h/2 = 10 m, spherical beyond", () => {
    expect(run({ powerW: 100, gainDbi: 10, model: "auto", apertureM: 2 })).toBeCloseTo(100 / (2 * Math.PI * 2 * 10), 6);
    // 10 kW: cylindrical would give 79.6 m > R* = 10 m, so the spherical distance applies.
    expect(run({ powerW: 10_000, gainDbi: 10, model: "auto", apertureM: 2 })).toBeCloseTo(Math.sqrt(100_000 / (40 * Math.PI)), 6);
  });
  it("aperture: inside the near field when S_nf exceeds the limit, on the 1/R transition otherwise", () => {
    // D = 1.2 m at 11 GHz (limit 10 W/m²), 10 W, 40.4 dBi (η ≈ 0.57): S_nf ≈ 20 W/m² > 10 ⇒ R = R_nf·S_nf/S_lim in the transition.
    const lambda = wavelengthM(11_000);
    const g = 10 ** 4.04;
    const eta = apertureEfficiency(g, 1.2, lambda);
    const snf = apertureNearFieldWm2(10, 1.2, eta);
    const rnf = apertureNearFieldExtentM(1.2, lambda);
    const d = evaluate({
      standard: "fcc",
      tier: "general",
      emitters: [{ id: "d", frequencyMHz: 11_000, powerW: 10, gainDbi: 40.4, model: "aperture", apertureM: 1.2, position: { x: 0, y: 0, z: 0 } }],
      points: [{ x: 0, y: 1, z: 0 }],
    }).emitters[0].complianceDistanceM;
    // By hand: η = Gλ²/(πD)² = 0.57305, S_nf = 16ηP/(πD²) = 20.268 W/m², R_nf = 13.209 m,
    // R = R_nf·S_nf/S_lim = 26.772 m, inside the transition (far field from 0.6D²/λ = 31.70 m).
    expect(eta).toBeCloseTo(0.57305, 4);
    expect(snf).toBeCloseTo(20.268, 2);
    expect(rnf).toBeCloseTo(13.209, 3);
    expect(d).toBeCloseTo(26.772, 2);
  });
});
