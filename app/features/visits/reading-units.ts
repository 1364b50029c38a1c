// A field reading as entered (value and unit) and as power density, by the plane-wave relations:
// S = E²/η₀, S = η₀·H² with η₀ = 376.73 Ω (the free-space impedance µ₀c, the engine's ETA0),
// 1 mW/cm² = 10 W/m², 1 µW/cm² = 0.01 W/m², and x % of a standard's limit = x/100 × its
// power-density limit at the reading's frequency. Pure: shared by forms, CSV import and the API.
import { limitAt } from "~/engine/limits";
import { eToS, ETA0, hToS, mwcm2ToWm2, uwcm2ToWm2 } from "~/engine/units";
import type { StandardId, Tier } from "./standards";
import { standardLabels, tierLabels } from "./standards";

export const READING_UNITS = ["V/m", "A/m", "W/m2", "mW/cm2", "uW/cm2", "percent"] as const;
export type ReadingUnit = (typeof READING_UNITS)[number];

export const readingUnitLabels: Record<ReadingUnit, string> = {
  "V/m": "V/m",
  "A/m": "A/m",
  "W/m2": "W/m²",
  "mW/cm2": "mW/cm²",
  "uW/cm2": "µW/cm²",
  percent: "% of a limit",
};

/** The impedance the conversions use, for the page to state: η₀ = 376.73 Ω. */
export const IMPEDANCE_OHM = ETA0;

const unitAliases = new Map<string, ReadingUnit>([
  ["v/m", "V/m"],
  ["a/m", "A/m"],
  ["w/m2", "W/m2"],
  ["w/m²", "W/m2"],
  ["w/m^2", "W/m2"],
  ["mw/cm2", "mW/cm2"],
  ["mw/cm²", "mW/cm2"],
  ["mw/cm^2", "mW/cm2"],
  ["uw/cm2", "uW/cm2"],
  ["uw/cm²", "uW/cm2"],
  ["uw/cm^2", "uW/cm2"],
  ["µw/cm2", "uW/cm2"], // U+00B5 micro sign
  ["µw/cm²", "uW/cm2"],
  ["μw/cm2", "uW/cm2"], // U+03BC Greek mu
  ["μw/cm²", "uW/cm2"],
  ["%", "percent"],
  ["percent", "percent"],
  ["% of limit", "percent"],
]);

/** The unit from what was written ("W/m²", "µW/cm2", "%"), or null. */
export function parseReadingUnit(raw: string): ReadingUnit | null {
  return unitAliases.get(raw.trim().toLowerCase().replace(/\s+/g, " ")) ?? null;
}

export type ReadingQuantity = { value: number; unit: ReadingUnit; frequencyMHz: number | null; standard: StandardId | null; tier: Tier | null };
export type Conversion =
  | { ok: true; powerDensityWm2: number | null; note: string | null }
  | { ok: false; field: "standard" | "tier" | "frequencyMHz"; message: string };

const BROADBAND_PERCENT_NOTE = "A broadband reading in % of a limit has no power density: the limit depends on frequency. Kept as % only.";

/** Power density in W/m² of one reading, or why it cannot be had. */
export function toPowerDensity(r: ReadingQuantity): Conversion {
  if (r.unit !== "percent") {
    if (r.standard || r.tier) return { ok: false, field: r.standard ? "standard" : "tier", message: "Name a standard and tier only for a reading in % of a limit." };
    return { ok: true, powerDensityWm2: fieldToDensity(r.value, r.unit), note: null };
  }
  if (!r.standard) return { ok: false, field: "standard", message: "Name the standard the % refers to." };
  if (!r.tier) return { ok: false, field: "tier", message: "Name the tier the % refers to: general or occupational." };
  if (r.frequencyMHz === null) return { ok: true, powerDensityWm2: null, note: BROADBAND_PERCENT_NOTE };
  try {
    const limit = limitAt(r.standard, r.tier, r.frequencyMHz);
    return { ok: true, powerDensityWm2: (r.value / 100) * limit.sWm2, note: null };
  } catch {
    return { ok: false, field: "frequencyMHz", message: `${r.frequencyMHz} MHz is outside the ${standardLabels[r.standard]} ${tierLabels[r.tier]} limits table.` };
  }
}

function fieldToDensity(value: number, unit: Exclude<ReadingUnit, "percent">): number {
  switch (unit) {
    case "V/m":
      return eToS(value, ETA0);
    case "A/m":
      return hToS(value, ETA0);
    case "W/m2":
      return value;
    case "mW/cm2":
      return mwcm2ToWm2(value);
    case "uW/cm2":
      return uwcm2ToWm2(value);
  }
}
