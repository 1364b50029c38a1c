// The exposure map's colour scale: total % of limit on a log axis from 1 % to 1000 %, drawn with
// viridis (perceptually uniform, readable with the common colour-vision deficiencies and in
// greyscale, whose lightness falls steadily from yellow to purple), reversed so that more
// exposure is darker. Below 1 % the map is left unfilled; above 1000 % the darkest colour holds.
import { scaleLog } from "d3-scale";
import { interpolateViridis } from "d3-scale-chromatic";

export const SCALE_MIN_PERCENT = 1;
export const SCALE_MAX_PERCENT = 1000;
/** Filled bands per decade: fine enough to read as continuous, coarse enough for small SVG paths. */
export const BANDS_PER_DECADE = 8;

const position = scaleLog().domain([SCALE_MIN_PERCENT, SCALE_MAX_PERCENT]).range([0, 1]).clamp(true);

/** 0 at 1 %, 1 at 1000 %, on a log axis; clamped. */
export function scalePosition(percent: number): number {
  if (!(percent > 0)) return 0;
  return position(percent);
}

/** The colour of a total % of limit, or null below the scale (no fill). */
export function colourOf(percent: number): string | null {
  if (!(percent >= SCALE_MIN_PERCENT)) return null;
  return interpolateViridis(1 - scalePosition(percent));
}

/** The lower edges of the filled bands: 1 % · 10^(k/8), k = 0 … 24 (1 % to 1000 %). */
export function bandThresholds(): number[] {
  const decades = Math.log10(SCALE_MAX_PERCENT / SCALE_MIN_PERCENT);
  const out: number[] = [];
  for (let k = 0; k <= decades * BANDS_PER_DECADE; k++) out.push(Number((SCALE_MIN_PERCENT * 10 ** (k / BANDS_PER_DECADE)).toPrecision(6)));
  return out;
}

/** A band's colour: the colour at the band's geometric middle, so the band reads as the values inside it. */
export function bandColour(lower: number): string {
  const upper = lower * 10 ** (1 / BANDS_PER_DECADE);
  return colourOf(lower >= SCALE_MAX_PERCENT ? lower : Math.sqrt(lower * upper))!;
}

export type LegendTick = { percent: number; label: string; at: number };

/** Legend ticks at 1, 2, 5 × 10ⁿ from 1 % to 1000 %, with their place (0–1) along the bar. */
export function legendTicks(): LegendTick[] {
  const ticks: LegendTick[] = [];
  for (let p = SCALE_MIN_PERCENT; p <= SCALE_MAX_PERCENT; p *= 10) {
    for (const m of [1, 2, 5]) {
      const percent = p * m;
      if (percent > SCALE_MAX_PERCENT) break;
      ticks.push({ percent, label: `${formatPercent(percent)}`, at: scalePosition(percent) });
    }
  }
  return ticks;
}

/** A percentage to three significant figures with a thin-spaced thousands separator: "0.0123 %", "12.3 %", "1 230 %". */
export function formatPercent(percent: number): string {
  if (!Number.isFinite(percent)) return "–";
  if (percent === 0) return "0 %";
  const rounded = Number(percent.toPrecision(3));
  const text = Math.abs(rounded) >= 1000 ? Math.round(rounded).toString().replace(/\B(?=(\d{3})+(?!\d))/g, "\u2009") : String(rounded);
  return `${text} %`;
}

// ---- The same scale for views that fill every cell (elevation cut, planner map): values below
// 1 % take the lightest colour instead of no fill, and colours come as bytes for canvases.

/** The scale's ends, in % of the limit. */
export const COLOUR_DOMAIN: readonly [number, number] = [SCALE_MIN_PERCENT, SCALE_MAX_PERCENT];
/** Ticks for the views' legends. */
export const COLOUR_TICKS = [1, 3, 10, 30, 100, 300, 1000] as const;

/** Position 0…1 of a percentage on the log axis (0 at 1 %, 1 at 1000 %), clamped. */
export const colourPosition = scalePosition;

/** The CSS colour of a percentage: the map's colour, and the lightest one below 1 %. */
export function percentColour(percent: number): string {
  return interpolateViridis(1 - colourPosition(percent));
}

/** 1024 steps of the reversed ramp as bytes, made once, for painting cells by the thousand. */
let lut: Uint8Array | null = null;
function ramp() {
  if (lut) return lut;
  lut = new Uint8Array(1024 * 3);
  for (let n = 0; n < 1024; n++) {
    const hex = interpolateViridis(1 - n / 1023); // "#rrggbb"
    for (let c = 0; c < 3; c++) lut[n * 3 + c] = parseInt(hex.slice(1 + 2 * c, 3 + 2 * c), 16);
  }
  return lut;
}

/** The colour as [r, g, b] 0…255 (canvases), from the ramp at 1/1023 steps. */
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
