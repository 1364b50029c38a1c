// Check values come from the published tables themselves: each limits table lists E, H and S
// side by side for the same row, so the plane-wave relations must carry one into the other.
import { describe, expect, it } from "vitest";
import { IMPEDANCE_OHM, parseReadingUnit, toPowerDensity, type ReadingQuantity } from "./reading-units";
import { parseStandard, parseTier } from "./standards";

const q = (value: number, unit: ReadingQuantity["unit"], more: Partial<ReadingQuantity> = {}): ReadingQuantity => ({ value, unit, frequencyMHz: null, standard: null, tier: null, ...more });
const density = (r: ReadingQuantity) => {
  const c = toPowerDensity(r);
  if (!c.ok) throw new Error(c.message);
  return c.powerDensityWm2;
};

describe("plane-wave relations S = E²/η₀ and S = η₀·H²", () => {
  it("uses η₀ = 376.73 Ω, the free-space impedance µ₀c (CODATA 2018), not the handbook's rounded 377", () => {
    expect(IMPEDANCE_OHM).toBeCloseTo(376.73, 2);
  });

  // 47 CFR §1.1310(e)(1) Table 1(A), 30–300 MHz occupational: 61.4 V/m, 0.163 A/m, 1.0 mW/cm².
  it("61.4 V/m and 0.163 A/m are both 1.0 mW/cm² = 10 W/m² (47 CFR §1.1310 Table 1(A), 30–300 MHz)", () => {
    expect(density(q(61.4, "V/m"))).toBeCloseTo(10, 1); // 61.4² / 376.73 = 10.007
    expect(density(q(0.163, "A/m"))).toBeCloseTo(10, 1); // 376.73 × 0.163² = 10.009
  });

  // 47 CFR §1.1310(e)(1) Table 1(B), 30–300 MHz general population: 27.5 V/m, 0.073 A/m, 0.2 mW/cm².
  it("27.5 V/m and 0.073 A/m are both 0.2 mW/cm² = 2 W/m² (47 CFR §1.1310 Table 1(B), 30–300 MHz)", () => {
    expect(density(q(27.5, "V/m"))).toBeCloseTo(2, 1);
    expect(density(q(0.073, "A/m"))).toBeCloseTo(2, 1);
  });

  // ICNIRP 2020 Table 5, >30–400 MHz occupational: 61 V/m, 0.16 A/m, 10 W/m² (the table rounds E and H).
  it("61 V/m is 10 W/m² to the table's rounding (ICNIRP 2020 Table 5, occupational, 30–400 MHz)", () => {
    expect(density(q(61, "V/m"))).toBeCloseTo(9.877, 3); // 3721 / 376.73
    expect(Math.abs(density(q(61, "V/m"))! - 10) / 10).toBeLessThan(0.015);
  });

  it("is exact arithmetic on E²: 1 V/m is 1/376.73 W/m², 10 V/m a hundred times that", () => {
    expect(density(q(1, "V/m"))).toBeCloseTo(1 / 376.730313668, 12);
    expect(density(q(10, "V/m"))! / density(q(1, "V/m"))!).toBeCloseTo(100, 9);
    expect(density(q(0, "V/m"))).toBe(0);
  });
});

describe("power-density units (SI: 1 mW/cm² = 10⁻³ W / 10⁻⁴ m²)", () => {
  it("1 mW/cm² = 10 W/m², 1 µW/cm² = 0.01 W/m², W/m² kept as it is", () => {
    expect(density(q(1, "mW/cm2"))).toBe(10);
    expect(density(q(0.2, "mW/cm2"))).toBeCloseTo(2, 12);
    expect(density(q(1, "uW/cm2"))).toBe(0.01);
    expect(density(q(580, "uW/cm2"))).toBeCloseTo(5.8, 12);
    expect(density(q(3.25, "W/m2"))).toBe(3.25);
  });
});

describe("% of a standard's limit at the reading's frequency", () => {
  // 47 CFR §1.1310 Table 1(B): 1500–100 000 MHz general population 1.0 mW/cm² = 10 W/m².
  it("50 % of FCC general at 1900 MHz is 5 W/m²", () => {
    expect(density(q(50, "percent", { frequencyMHz: 1900, standard: "fcc", tier: "general" }))).toBeCloseTo(5, 12);
  });
  // 47 CFR §1.1310 Table 1(B): 300–1500 MHz general population f/1500 mW/cm²; at 850 MHz 0.5667 mW/cm².
  it("25 % of FCC general at 850 MHz is 0.25 × 850/1500 mW/cm² = 1.4167 W/m²", () => {
    expect(density(q(25, "percent", { frequencyMHz: 850, standard: "fcc", tier: "general" }))).toBeCloseTo(1.41667, 4);
  });
  // ICNIRP 2020 Table 5: >2–300 GHz general public 10 W/m²; occupational 50 W/m².
  it("12 % of ICNIRP 2020 at 3500 MHz is 1.2 W/m² (general) and 6 W/m² (occupational)", () => {
    expect(density(q(12, "percent", { frequencyMHz: 3500, standard: "icnirp-2020", tier: "general" }))).toBeCloseTo(1.2, 12);
    expect(density(q(12, "percent", { frequencyMHz: 3500, standard: "icnirp-2020", tier: "occupational" }))).toBeCloseTo(6, 12);
  });

  it("keeps a broadband % reading as % and says its density is not defined without a frequency", () => {
    const c = toPowerDensity(q(40, "percent", { standard: "icnirp-2020", tier: "general" }));
    expect(c).toMatchObject({ ok: true, powerDensityWm2: null });
    expect(c.ok && c.note).toMatch(/no power density/);
  });

  it("refuses a % without standard or tier, a frequency outside the standard's table, and a standard on a field reading", () => {
    expect(toPowerDensity(q(10, "percent", { frequencyMHz: 900, tier: "general" }))).toMatchObject({ ok: false, field: "standard" });
    expect(toPowerDensity(q(10, "percent", { frequencyMHz: 900, standard: "fcc" }))).toMatchObject({ ok: false, field: "tier" });
    // FCC Table 1 covers 0.3 MHz–100 GHz.
    expect(toPowerDensity(q(10, "percent", { frequencyMHz: 200_000, standard: "fcc", tier: "general" }))).toMatchObject({ ok: false, field: "frequencyMHz" });
    expect(toPowerDensity(q(3, "V/m", { standard: "fcc" }))).toMatchObject({ ok: false, field: "standard" });
  });
});

describe("what people write for units, standards and tiers", () => {
  it("reads the units with or without superscripts, micro sign or Greek mu, in any case", () => {
    expect(["V/m", "v/m", " V/m "].map(parseReadingUnit)).toEqual(["V/m", "V/m", "V/m"]);
    expect(["W/m²", "W/m2", "w/m^2"].map(parseReadingUnit)).toEqual(["W/m2", "W/m2", "W/m2"]);
    expect(["µW/cm²", "μW/cm2", "uW/cm2"].map(parseReadingUnit)).toEqual(["uW/cm2", "uW/cm2", "uW/cm2"]);
    expect(["mW/cm²", "%", "percent"].map(parseReadingUnit)).toEqual(["mW/cm2", "percent", "percent"]);
    expect(["dBm", "V", "W/m3", ""].map(parseReadingUnit)).toEqual([null, null, null, null]);
  });

  it("reads standards by id or name, and tiers by their usual synonyms", () => {
    expect(["fcc", "FCC", "ICNIRP 2020", "icnirp_1998", "IEEE C95.1-2019", "Safety Code 6"].map(parseStandard)).toEqual(["fcc", "fcc", "icnirp-2020", "icnirp-1998", "ieee-c95.1-2019", "sc6-2015"]);
    expect(parseStandard("ICNIRP")).toBeNull();
    expect(["general", "Uncontrolled", "general public", "occupational", "controlled"].map(parseTier)).toEqual(["general", "general", "general", "occupational", "occupational"]);
    expect(parseTier("everyone")).toBeNull();
  });
});
