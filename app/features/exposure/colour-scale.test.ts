// The exposure colour scale: log axis from 1 % to 1000 % (common practice, no source), viridis from d3-scale-chromatic.
import { interpolateViridis } from "d3-scale-chromatic";
import { describe, expect, it } from "vitest";
import { colourPosition, percentColour, percentLabel, percentRgb } from "./colour-scale";

describe("colour scale", () => {
  it("places percentages on a log axis, clamped at the ends", () => {
    expect(colourPosition(1)).toBe(0);
    expect(colourPosition(0)).toBe(0);
    expect(colourPosition(10)).toBeCloseTo(1 / 3, 12);
    expect(colourPosition(100)).toBeCloseTo(2 / 3, 12);
    expect(colourPosition(5000)).toBe(1);
  });
  it("uses viridis and gives the same colour as bytes", () => {
    expect(percentColour(100)).toBe(interpolateViridis(2 / 3));
    const hex = (rgb: number[]) => `#${rgb.map((v) => v.toString(16).padStart(2, "0")).join("")}`;
    expect(hex(percentRgb(100))).toBe(interpolateViridis(Math.round((2 / 3) * 1023) / 1023));
    expect(percentRgb(1)).toEqual([68, 1, 84]); // viridis' first colour, #440154
  });
  it("labels percentages briefly", () => {
    expect(percentLabel(0.04)).toBe("0.04 %");
    expect(percentLabel(2.46)).toBe("2.5 %");
    expect(percentLabel(277.78)).toBe("278 %");
    expect(percentLabel(12345)).toBe("12 345 %");
  });
});
