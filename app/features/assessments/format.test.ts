import { describe, expect, it } from "vitest";
import { areaFigure, figure, figure3 } from "./format";

// Display rounding, common practice, no source.
describe("figures", () => {
  it("keeps four (or three) significant figures without exponent notation", () => {
    expect(figure(4589.21)).toBe("4,589");
    expect(figure(12600.4)).toBe("12,600");
    expect(figure(0.733312)).toBe("0.7333");
    expect(figure3(4589.21)).toBe("4,590");
    expect(figure3(5.1288)).toBe("5.13");
  });

  it("gives areas to 0.1 m² with thousands grouped", () => {
    expect(areaFigure(1120)).toBe("1,120.0");
    expect(areaFigure(0)).toBe("0.0");
    expect(areaFigure(2.04)).toBe("2.0");
  });
});
