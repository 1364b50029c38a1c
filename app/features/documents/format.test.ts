// How documents write numbers: as the web pages do, thousands grouped (common practice, no source).
import { describe, expect, it } from "vitest";
import { areaText, metresText, percentText, wattsText } from "./format";

describe("document number formats", () => {
  it("groups thousands and keeps the precision by size", () => {
    expect(percentText(4589.4)).toBe("4,589 %");
    expect(percentText(100)).toBe("100 %");
    expect(percentText(15.94)).toBe("15.9 %");
    expect(percentText(0.456)).toBe("0.46 %");
    expect(areaText(1120)).toBe("1,120.0 m²");
    expect(wattsText(12345.6)).toBe("12,346 W");
    expect(wattsText(42.25)).toBe("42.3 W");
    expect(metresText(1234.5)).toBe("1,234.50 m");
  });
});
