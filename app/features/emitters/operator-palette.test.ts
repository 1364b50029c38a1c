import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { initials, OPERATOR_PALETTE, operatorColours } from "./operator-palette";

// CIE 1976 ΔE*ab between sRGB colours (sRGB → XYZ D65 → L*a*b*; IEC 61966-2-1 and CIE 15:2004).
function lab(hex: string) {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255).map((c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  const xyz = [(0.4124 * r + 0.3576 * g + 0.1805 * b) / 0.95047, 0.2126 * r + 0.7152 * g + 0.0722 * b, (0.0193 * r + 0.1192 * g + 0.9505 * b) / 1.08883];
  const f = (t: number) => (t > 216 / 24389 ? Math.cbrt(t) : (24389 / 27 * t + 16) / 116);
  const [fx, fy, fz] = xyz.map(f);
  return [116 * fy - 16, 500 * (fx - fy), 200 * (fy - fz)];
}
const deltaE = (a: string, b: string) => Math.hypot(...lab(a).map((v, i) => v - lab(b)[i]));

const css = readFileSync(new URL("../../app.css", import.meta.url), "utf8");
const token = (name: string) => css.match(new RegExp(`--color-${name}:\\s*(#[0-9a-fA-F]{6})`))![1];

describe("operator palette", () => {
  it.each(["flag-600", "flag-700", "flag-400", "danger-700", "caution-700", "caution-500", "ok-700"])("keeps away from the %s token (ΔE ≥ 20)", (name) => {
    for (const colour of OPERATOR_PALETTE) expect(deltaE(colour, token(name)), colour).toBeGreaterThanOrEqual(20);
  });

  it("gives each operator one colour, stable by name", () => {
    const map = operatorColours(["Quay", "Northwind", "Quay", ""]);
    expect([...map.keys()]).toEqual(["—", "Northwind", "Quay"]);
    expect(new Set(map.values()).size).toBe(3);
    expect(initials("Northwind Mobile")).toBe("NM");
    expect(initials("quay")).toBe("QU");
  });
});
