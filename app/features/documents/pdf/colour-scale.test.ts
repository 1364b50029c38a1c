// The PDF maps' colours run the same way as the web map's (common practice, no source: one scale
// per product, so a landlord comparing the letter with the portal reads them alike).
import { interpolateViridis } from "d3-scale-chromatic";
import { describe, expect, it } from "vitest";
import { colourOf as webColour } from "~/features/exposure/colour-scale";
import { colourOf, fillOf } from "./colour-scale";

const lightness = (hex: string) => {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255);
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
};

describe("PDF colour scale", () => {
  it("has the web map's ends: light for 1 %, dark for 1000 % and above", () => {
    expect(colourOf(1)).toBe(interpolateViridis(1));
    expect(colourOf(1)).toBe(webColour(1));
    expect(colourOf(1000)).toBe(webColour(1000));
    expect(colourOf(5000)).toBe(interpolateViridis(0));
  });

  it("gets darker as the value grows, as the web map does", () => {
    const values = [1, 3, 10, 30, 100, 300, 1000];
    for (let i = 1; i < values.length; i++) {
      expect(lightness(colourOf(values[i]))).toBeLessThan(lightness(colourOf(values[i - 1])));
      expect(lightness(webColour(values[i])!)).toBeLessThan(lightness(webColour(values[i - 1])!));
    }
  });

  it("leaves cells under 1 % unfilled, as the web map does, and fills from 1 % on", () => {
    for (const v of [0, 0.2, 0.999]) {
      expect(fillOf(v)).toBeNull();
      expect(webColour(v)).toBeNull();
    }
    expect(fillOf(1)).toBe(colourOf(1));
    expect(fillOf(250)).toBe(colourOf(250));
  });
});
