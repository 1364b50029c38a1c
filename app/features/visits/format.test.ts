import { describe, expect, it } from "vitest";
import { formatBytes, formatCameraTime, formatDensity, formatFrequency, formatMetres, formatNumber, formatReadingValue } from "./format";

describe("formatNumber", () => {
  it("gives three significant figures without an exponent in the usual range", () => {
    expect([0.10007, 5.8, 1234.5, 0.000123456, 12, 0].map((n) => formatNumber(n))).toEqual(["0.100", "5.80", "1235", "0.000123", "12.0", "0"]);
    expect(formatNumber(2.5e-9)).toBe("2.50e-9");
  });
});

describe("reading texts", () => {
  it("shows the value as entered with its unit, and a % with its standard and tier", () => {
    expect(formatReadingValue({ value: 6.14, unit: "V/m", percentStandard: null, percentTier: null })).toBe("6.14 V/m");
    expect(formatReadingValue({ value: 580, unit: "uW/cm2", percentStandard: null, percentTier: null })).toBe("580 µW/cm²");
    expect(formatReadingValue({ value: 50, unit: "percent", percentStandard: "icnirp-2020", percentTier: "general" })).toBe("50 % of ICNIRP 2020, general");
    expect(formatReadingValue({ value: 20, unit: "percent", percentStandard: "fcc", percentTier: "occupational" })).toBe("20 % of FCC §1.1310, occupational");
  });

  it("writes densities, frequencies, metres and sizes", () => {
    expect(formatDensity(0.10007)).toBe("0.100 W/m²");
    expect(formatDensity(null)).toBe("—");
    expect([formatFrequency(null), formatFrequency(1900)]).toEqual(["broadband", "1900 MHz"]);
    expect(formatMetres(1.23456)).toBe("1.235");
    expect(formatCameraTime(new Date("2026-03-14T10:22:05Z"))).toBe("14 Mar 2026, 10:22");
    expect([formatBytes(512), formatBytes(2048), formatBytes(3.5 * 1024 * 1024)]).toEqual(["512 B", "2 KB", "3.5 MB"]);
  });
});
