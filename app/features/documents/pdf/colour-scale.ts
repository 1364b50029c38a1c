// The PDF maps' colour scale: the web map's own (features/exposure/colour-scale.ts: total % of limit
// on a log axis from 1 % to 1000 %, viridis reversed, light for little and dark for most), quantised
// to 48 steps so that neighbouring cells of one colour merge into one rectangle.
import { colourOf as mapColour, scalePosition, SCALE_MAX_PERCENT, SCALE_MIN_PERCENT } from "~/features/exposure/colour-scale";

export { scalePosition };
export const SCALE_TICKS = [1, 10, 100, 1000];
/** Contour lines drawn and labelled on the maps. */
export const MAP_CONTOURS = [50, 100, 500];

/** A map cell's fill: none below 1 %, as on the web map, else the quantised colour. */
export function fillOf(percent: number): string | null {
  return percent >= SCALE_MIN_PERCENT ? colourOf(percent) : null;
}

const steps = 48;
const cache = new Map<number, string>();
/** The colour of a percentage (values under 1 % take the scale's lightest), quantised to 48 steps along the axis. */
export function colourOf(percent: number): string {
  const q = Math.round(scalePosition(Math.max(SCALE_MIN_PERCENT, percent)) * steps);
  let hex = cache.get(q);
  if (!hex) cache.set(q, (hex = mapColour(SCALE_MIN_PERCENT * (SCALE_MAX_PERCENT / SCALE_MIN_PERCENT) ** (q / steps))!));
  return hex;
}
