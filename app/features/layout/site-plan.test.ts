import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { SitePlan, type PlanSurface } from "./site-plan";

// A penthouse roof inside a main roof, listed first (higher levels first), as the Layout page does.
const surfaces: PlanSurface[] = [
  { id: "top", name: "Penthouse top", kind: "area", polygon: [[20, 15], [32, 15], [32, 24], [20, 24]], elevationM: 4.2, access: "none" },
  { id: "main", name: "Main roof", kind: "area", polygon: [[0, 0], [40, 0], [40, 28], [0, 28]], elevationM: 0, access: "workers" },
];

describe("the site plan", () => {
  it("draws every area's name after every area's and obstruction's fill, so none is hidden under a later one", () => {
    const html = renderToStaticMarkup(
      createElement(SitePlan, { title: "Plan", surfaces, obstructions: [{ id: "ph", name: "Penthouse", polygon: [[20, 15], [32, 15], [32, 24], [20, 24]], heightM: 4.2 }] }),
    );
    const lastFill = Math.max(html.lastIndexOf('fill="url(#plan-workers)"'), html.lastIndexOf('fill="url(#plan-solid)"'));
    expect(lastFill).toBeGreaterThan(0);
    expect(html.indexOf(">Penthouse top<")).toBeGreaterThan(lastFill);
    expect(html.indexOf(">Main roof<")).toBeGreaterThan(lastFill);
  });
});
