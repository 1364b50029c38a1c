import { describe, expect, it } from "vitest";
import { calibrationWarnings, oneYearAfter } from "./calibration";

const probe = (calibrationDate: string | null) => ({ probe: "Broadband probe", serial: "BP-114", calibrationDate });

describe("calibrationWarnings", () => {
  it("is quiet for a calibration within the year before the visit, the visit day and exactly one year before included", () => {
    expect(calibrationWarnings("2026-06-10", [probe("2026-06-10"), probe("2025-11-02"), probe("2025-06-10")])).toEqual([]);
  });

  it("warns for a calibration more than a year older than the visit", () => {
    const [w] = calibrationWarnings("2026-06-11", [probe("2025-06-10")]);
    expect(w.index).toBe(0);
    expect(w.message).toBe("Broadband probe, serial BP-114: calibrated on 10 Jun 2025, more than a year before the visit on 11 Jun 2026.");
  });

  it("warns for a calibration dated after the visit", () => {
    expect(calibrationWarnings("2026-06-10", [probe("2026-06-11")])[0].message).toContain("after the visit");
  });

  it("warns when no calibration date is recorded, and names each instrument by its position", () => {
    const warnings = calibrationWarnings("2026-06-10", [probe("2026-01-01"), { probe: "Meter", serial: "", calibrationDate: null }]);
    expect(warnings).toEqual([{ index: 1, message: "Meter: no calibration date recorded." }]);
  });

  it("counts a year by the calendar, leap days included", () => {
    expect(oneYearAfter("2025-03-01")).toBe("2026-03-01");
    expect(oneYearAfter("2024-02-29")).toBe("2025-03-01");
  });
});
