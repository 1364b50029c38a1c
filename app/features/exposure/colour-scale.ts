// The one colour scale of exposure results (maps, elevation and 3D views): total % of limit on a
// log axis, viridis (perceptually uniform, colour-blind safe, reads in greyscale). Values outside
// the domain take the end colours. Tiny and pure so every view shares it.
import { interpolateViridis } from "d3-scale-chromatic";

/** The scale's ends, in % of the limit: 1 % (dark) to 1000 % (yellow); 100 % sits at two thirds. */
export const COLOUR_DOMAIN: readonly [number, number] = [1, 1000];
/** Ticks for legends. */
export const COLOUR_TICKS = [1, 3, 10, 30, 100, 300, 1000] as const;

/** Position 0…1 of a percentage on the log axis, clamped. */
export function colourPosition(percent: number): number {
  const [lo, hi] = COLOUR_DOMAIN;
  if (!(percent > lo)) return 0;
  if (percent >= hi) return 1;
  return Math.log(percent / lo) / Math.log(hi / lo);
}

/** The CSS colour (rgb(…)) of a percentage. */
export function percentColour(percent: number): string {
  return interpolateViridis(colourPosition(percent));
}

/** 1024 steps of the ramp as bytes, made once, for painting cells by the thousand. */
let lut: Uint8Array | null = null;
function ramp() {
  if (lut) return lut;
  lut = new Uint8Array(1024 * 3);
  for (let n = 0; n < 1024; n++) {
    const hex = interpolateViridis(n / 1023); // "#rrggbb"
    for (let c = 0; c < 3; c++) lut[n * 3 + c] = parseInt(hex.slice(1 + 2 * c, 3 + 2 * c), 16);
  }
  return lut;
}

/** The colour as [r, g, b] 0…255 (for canvases and WebGL), from the ramp at 1/1023 steps. */
export function percentRgb(percent: number): [number, number, number] {
  const t = ramp();
  const n = Math.round(colourPosition(percent) * 1023) * 3;
  return [t[n], t[n + 1], t[n + 2]];
}

/** "0.5 %", "12 %", "1 200 %": short labels for ticks and contours. */
export function percentLabel(percent: number): string {
  if (percent >= 1000) return `${Math.round(percent).toLocaleString("en-GB").replace(/,/g, " ")} %`;
  if (percent >= 10) return `${Math.round(percent)} %`;
  if (percent >= 1) return `${Number(percent.toFixed(1))} %`;
  return `${Number(percent.toPrecision(1))} %`;
}
