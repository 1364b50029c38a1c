// The map's colour scale: viridis (reversed) on a log axis of % of limit, 1 % to 1000 %.
import { interpolateViridis } from "d3-scale-chromatic";
import { describe, expect, it } from "vitest";
import { bandColour, bandThresholds, colourOf, colourPosition, formatPercent, legendTicks, percentColour, percentLabel, percentRgb, scalePosition } from "./colour-scale";

describe("colour scale", () => {
  it("places percentages on a log axis: each decade a third of the bar (common practice, no source)", () => {
    expect(scalePosition(1)).toBe(0);
    expect(scalePosition(10)).toBeCloseTo(1 / 3, 12);
    expect(scalePosition(100)).toBeCloseTo(2 / 3, 12);
    expect(scalePosition(1000)).toBe(1);
    expect(scalePosition(5000)).toBe(1);
    expect(scalePosition(0)).toBe(0);
  });

  it("leaves values below 1 % unfilled and runs viridis from yellow (low) to purple (high)", () => {
    expect(colourOf(0.5)).toBeNull();
    expect(colourOf(1)).toBe(interpolateViridis(1));
    expect(colourOf(1000)).toBe(interpolateViridis(0));
    expect(colourOf(1e6)).toBe(interpolateViridis(0));
  });

  it("gets darker as the value grows (viridis' lightness falls monotonically when reversed)", () => {
    const lum = (hex: string) => {
      const [r, g, b] = [1, 3, 5].map((k) => parseInt(hex.slice(k, k + 2), 16) / 255);
      return 0.2126 * r + 0.7152 * g + 0.0722 * b; // relative luminance weights, ITU-R BT.709
    };
    const values = bandThresholds().map((t) => lum(bandColour(t)));
    for (let k = 1; k < values.length; k++) expect(values[k]).toBeLessThan(values[k - 1]);
  });

  it("has eight bands per decade from 1 % to 1000 %, with 100 % among the edges", () => {
    const t = bandThresholds();
    expect(t).toHaveLength(25);
    expect(t[0]).toBe(1);
    expect(t[8]).toBe(10);
    expect(t[16]).toBe(100);
    expect(t[24]).toBe(1000);
  });

  it("labels the legend at 1, 2, 5 × 10ⁿ", () => {
    expect(legendTicks().map((t) => t.percent)).toEqual([1, 2, 5, 10, 20, 50, 100, 200, 500, 1000]);
    expect(legendTicks().find((t) => t.percent === 100)).toMatchObject({ label: "100 %" });
  });

  it("writes percentages to three significant figures", () => {
    expect(formatPercent(4576.5269)).toBe("4\u2009580 %");
    expect(formatPercent(12.345)).toBe("12.3 %");
    expect(formatPercent(0.012345)).toBe("0.0123 %");
    expect(formatPercent(0)).toBe("0 %");
  });
});

describe("the same scale for the elevation and planner views (log axis from 1 % to 1000 %: common practice, no source)", () => {
  it("places percentages on the map's log axis, clamped at the ends", () => {
    expect(colourPosition(1)).toBe(0);
    expect(colourPosition(0)).toBe(0);
    expect(colourPosition(10)).toBeCloseTo(1 / 3, 12);
    expect(colourPosition(100)).toBeCloseTo(2 / 3, 12);
    expect(colourPosition(5000)).toBe(1);
  });
  it("gives the map's colours, the lightest below 1 %, and the same as bytes", () => {
    expect(percentColour(100)).toBe(colourOf(100));
    expect(percentColour(0.2)).toBe(interpolateViridis(1));
    const hex = (rgb: number[]) => `#${rgb.map((v) => v.toString(16).padStart(2, "0")).join("")}`;
    expect(hex(percentRgb(100))).toBe(interpolateViridis(1 - Math.round((2 / 3) * 1023) / 1023));
    expect(percentRgb(1000)).toEqual([68, 1, 84]); // viridis' first colour, #440154, for the most exposure
  });
  it("labels percentages briefly", () => {
    expect(percentLabel(0.04)).toBe("0.04 %");
    expect(percentLabel(2.46)).toBe("2.5 %");
    expect(percentLabel(277.78)).toBe("278 %");
    expect(percentLabel(12345)).toBe("12 345 %");
  });
});
