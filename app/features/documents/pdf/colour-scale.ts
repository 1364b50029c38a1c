// The maps' colour scale: total % of limit on a log axis from 1 % to 1000 %, through viridis
// (d3-scale-chromatic), the perceptual, colour-blind-safe scale the portal's maps use, reversed as
// on the web (features/exposure/colour-scale.ts): light yellow for little, dark purple for most.
import { interpolateViridis } from "d3-scale-chromatic";

export const SCALE_MIN_PERCENT = 1;
export const SCALE_MAX_PERCENT = 1000;
export const SCALE_TICKS = [1, 10, 100, 1000];
/** Contour lines drawn and labelled on the maps. */
export const MAP_CONTOURS = [50, 100, 500];

/** 0–1 along the log axis (clamped). */
export function scalePosition(percent: number) {
  const v = Math.min(SCALE_MAX_PERCENT, Math.max(SCALE_MIN_PERCENT, percent));
  return Math.log10(v / SCALE_MIN_PERCENT) / Math.log10(SCALE_MAX_PERCENT / SCALE_MIN_PERCENT);
}

const steps = 48;
const cache = new Map<number, string>();
/** The hex colour of a percentage, quantised to 48 steps so neighbouring cells merge into one rectangle. */
export function colourOf(percent: number): string {
  const q = Math.round(scalePosition(percent) * steps);
  let hex = cache.get(q);
  if (!hex) {
    const c = interpolateViridis(1 - q / steps);
    hex = c.startsWith("#") ? c : `#${c.match(/\d+/g)!.map((v) => Number(v).toString(16).padStart(2, "0")).join("")}`;
    cache.set(q, hex);
  }
  return hex;
}
