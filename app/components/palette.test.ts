// The palette's two promises, checked from app.css itself:
// 1. text tokens meet WCAG 2.x AA contrast (4.5:1) on the surfaces they are used on;
// 2. the accent and state colours stay far from every colour of the exposure maps' scales,
//    so none of them can be read as a value on a map.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";

const css = readFileSync(new URL("../app.css", import.meta.url), "utf8");
const token = (name: string) => {
  const hex = css.match(new RegExp(`--color-${name}:\\s*(#[0-9a-f]{6})`, "i"))?.[1];
  if (!hex) throw new Error(`no colour token ${name}`);
  return hex;
};

const channels = (hex: string) => [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255);
const linear = (c: number) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4);

// WCAG 2.2, "relative luminance" and "contrast ratio" definitions.
function contrast(a: string, b: string) {
  const lum = (hex: string) => {
    const [r, g, bl] = channels(hex).map(linear);
    return 0.2126 * r + 0.7152 * g + 0.0722 * bl;
  };
  const [hi, lo] = [lum(a), lum(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

// CIE 1976 L*a*b* (D65) and the ΔE*ab distance between two colours.
function lab(hex: string) {
  const [r, g, b] = channels(hex).map(linear);
  const xyz = [(0.4124 * r + 0.3576 * g + 0.1805 * b) / 0.95047, 0.2126 * r + 0.7152 * g + 0.0722 * b, (0.0193 * r + 0.1192 * g + 0.9505 * b) / 1.08883];
  const [fx, fy, fz] = xyz.map((t) => (t > 216 / 24389 ? Math.cbrt(t) : (24389 / 27) * t / 116 + 16 / 116));
  return [116 * fy - 16, 500 * (fx - fy), 200 * (fy - fz)];
}
const deltaE = (a: string, b: string) => Math.hypot(...lab(a).map((v, i) => v - lab(b)[i]));

// Ten evenly spaced samples of each scale, from memory (matplotlib's viridis and cividis, as
// d3-scale-chromatic ships them); the test walks 20 steps between neighbours in sRGB.
const viridis = ["#440154", "#482878", "#3e4989", "#31688e", "#26828e", "#1f9e89", "#35b779", "#6ece58", "#b5de2b", "#fde725"];
const cividis = ["#00224e", "#123570", "#3b496c", "#575d6d", "#707173", "#8a8678", "#a59c74", "#c3b369", "#e1cc55", "#fee838"];
function along(stops: string[]) {
  const hex = (v: number) => Math.round(v * 255).toString(16).padStart(2, "0");
  return stops.slice(1).flatMap((to, i) =>
    Array.from({ length: 20 }, (_, k) => {
      const [a, b] = [channels(stops[i]), channels(to)];
      return `#${a.map((c, j) => hex(c + ((b[j] - c) * k) / 20)).join("")}`;
    }),
  );
}
const nearest = (colour: string, stops: string[]) => Math.min(...along(stops).map((s) => deltaE(colour, s)));

describe("palette", () => {
  it.each([
    ["ink-900", "sheet"],
    ["ink-900", "paper"],
    ["graphite-600", "sheet"],
    ["graphite-600", "paper"],
    ["graphite-500", "paper"],
    ["flag-600", "sheet"],
    ["flag-600", "paper"],
    ["white", "ink-900"],
    ["danger-700", "danger-100"],
    ["caution-700", "caution-100"],
    ["ok-700", "ok-100"],
  ])("%s on %s reaches 4.5:1", (text, surface) => {
    expect(contrast(token(text), token(surface))).toBeGreaterThanOrEqual(4.5);
  });

  it("control borders reach 3:1 against the sheet (WCAG 1.4.11)", () => {
    expect(contrast(token("rule-strong"), token("sheet"))).toBeGreaterThanOrEqual(3);
  });

  it.each(["flag-400", "flag-600", "flag-700", "danger-700", "caution-700", "ok-700"])("%s is at least ΔE 25 from viridis and cividis", (name) => {
    expect(nearest(token(name), viridis)).toBeGreaterThanOrEqual(25);
    expect(nearest(token(name), cividis)).toBeGreaterThanOrEqual(25);
  });

  it("would have caught the old teal accent, which sat on viridis", () => {
    expect(nearest("#0b655f", viridis)).toBeLessThan(25);
  });
});
