// Readings as people read them: three significant figures, no exponent in the usual range,
// the unit as entered, and a % reading named with its standard and tier.
import { readingUnitLabels, type ReadingUnit } from "./reading-units";
import { standardShortLabels, type StandardId, type Tier } from "./standards";

/** 3 significant figures: 0.100, 5.80, 1230, 0.000123; an exponent only outside 1e-6…1e9. */
export function formatNumber(n: number, significant = 3): string {
  if (n === 0) return "0";
  const abs = Math.abs(n);
  if (abs < 1e-6 || abs >= 1e9) return n.toExponential(significant - 1);
  const digits = Math.max(0, significant - 1 - Math.floor(Math.log10(abs)));
  return n.toFixed(Math.min(digits, 12));
}

/** A coordinate or height in metres as entered, up to 3 decimals. */
export function formatMetres(n: number): string {
  return String(Math.round(n * 1000) / 1000);
}

type ReadingLike = { value: number; unit: ReadingUnit | string; percentStandard: string | null; percentTier: string | null };

/** "6.14 V/m", "580 µW/cm²", "50 % of ICNIRP 2020, general", "20 % of FCC §1.1310, occupational". */
export function formatReadingValue(r: ReadingLike): string {
  const value = String(r.value);
  if (r.unit !== "percent") return `${value} ${readingUnitLabels[r.unit as ReadingUnit] ?? r.unit}`;
  const standard = standardShortLabels[r.percentStandard as StandardId] ?? r.percentStandard ?? "?";
  return `${value} % of ${standard}, ${(r.percentTier as Tier | null) ?? "?"}`;
}

/** "0.100 W/m²", or a dash with the reason for a broadband % reading. */
export function formatDensity(wm2: number | null): string {
  return wm2 === null ? "—" : `${formatNumber(wm2)} W/m²`;
}

export function formatFrequency(mhz: number | null): string {
  return mhz === null ? "broadband" : `${String(mhz)} MHz`;
}

/** "14 Mar 2026, 10:22": the camera clock's reading, stored as if UTC and shown without a zone. */
export function formatCameraTime(value: Date | string): string {
  const iso = new Date(value).toISOString();
  const [y, m, d] = iso.slice(0, 10).split("-").map(Number);
  const month = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"][m - 1];
  return `${d} ${month} ${y}, ${iso.slice(11, 16)}`;
}

export function formatBytes(n: number): string {
  if (n < 1024) return `${n} B`;
  if (n < 1024 * 1024) return `${(n / 1024).toFixed(0)} KB`;
  return `${(n / 1024 / 1024).toFixed(1)} MB`;
}
