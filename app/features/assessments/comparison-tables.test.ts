import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { compareAssessments } from "./compare";
import { ComparisonTables } from "./comparison-tables";

const side = (gridStepM: number, power: number, z: number) => ({
  options: { standard: "fcc", tier: "general", gridStepM },
  inventory: { emitters: [{ id: "e1", label: "NW-A7", powerPerCarrierW: power, position: { x: 1, y: 2, z } }], surfaces: [] },
  summary: { worstPercent: 10, areas: [] },
  results: { surfaces: [] },
});

describe("the comparison of two assessments", () => {
  it("names changed options and fields as people read them, not by their keys", () => {
    const text = renderToStaticMarkup(createElement(ComparisonTables, { comparison: compareAssessments(side(0.5, 60, 6), side(1, 20, 6.5)) })).replace(/<[^>]+>/g, "");
    expect(text).toContain("Options: Grid step (m) 0.5 → 1");
    expect(text).toContain("Power per carrier (W) 60 → 20");
    expect(text).toContain("z (m) 6 → 6.5");
    expect(text).not.toMatch(/gridStepM|powerPerCarrierW|position\.z/);
  });
});
