// Geometry checks. Expected values are worked by hand from the definitions cited in geometry.ts
// (the shoelace formula; SEGMENTS-INTERSECT, Cormen et al. §33.1, from memory).
import { describe, expect, it } from "vitest";
import { issuesByPath, orientation, polygonIssue, segmentsIntersect, selfIntersection, signedArea, validateLayout, type LayoutGeometry, type XY } from "./geometry";

const square: XY[] = [[0, 0], [10, 0], [10, 10], [0, 10]];
const area = (polygon: XY[], name = "Main roof", elevationM = 0) => ({ name, kind: "area" as const, polygon, elevationM });
const facade = (line: XY[], bottomM = 0, topM = 10, name = "East facade") => ({ name, kind: "facade" as const, line, bottomM, topM });

describe("signed area (shoelace)", () => {
  it("is +100 m² for a 10 m square run anticlockwise and −100 m² clockwise", () => {
    expect(signedArea(square)).toBe(100);
    expect(signedArea([...square].reverse())).toBe(-100);
  });
  it("is 6 m² for the 3-4-5 right triangle", () => {
    expect(signedArea([[0, 0], [4, 0], [0, 3]])).toBe(6);
  });
});

describe("segment intersection", () => {
  it("finds a proper crossing", () => expect(segmentsIntersect([0, 0], [2, 2], [0, 2], [2, 0])).toBe(true));
  it("finds an end touching the other segment", () => expect(segmentsIntersect([0, 0], [2, 0], [1, 0], [1, 5])).toBe(true));
  it("finds collinear overlap", () => expect(segmentsIntersect([0, 0], [3, 0], [2, 0], [5, 0])).toBe(true));
  it("finds collinear segments that meet end to end", () => expect(segmentsIntersect([0, 0], [1, 0], [1, 0], [2, 0])).toBe(true));
  it("separates collinear segments with a gap", () => expect(segmentsIntersect([0, 0], [1, 0], [1.1, 0], [2, 0])).toBe(false));
  it("separates parallel segments", () => expect(segmentsIntersect([0, 0], [5, 0], [0, 0.1], [5, 0.1])).toBe(false));
  it("separates segments whose lines cross outside them", () => expect(segmentsIntersect([0, 0], [1, 1], [3, 0], [2, 1])).toBe(false));
  it("treats points rounded to 0.1 m on one line as collinear", () => expect(orientation([0.1, 0.1], [0.3, 0.3], [0.7, 0.7])).toBe(0));
});

describe("self-intersection", () => {
  it("finds the crossing of a bow tie, with its edges and point", () => {
    expect(selfIntersection([[0, 0], [10, 10], [10, 0], [0, 10]])).toEqual({ edgeA: 0, edgeB: 2, point: [5, 5] });
  });
  it("finds a corner that touches another edge", () => {
    // The fourth point (5, 0) lies on the first edge (0,0)–(10,0).
    expect(selfIntersection([[0, 0], [10, 0], [10, 10], [5, 0], [0, 10]])).not.toBeNull();
  });
  it("finds an outline that folds back along itself", () => {
    expect(selfIntersection([[0, 0], [10, 0], [5, 0], [5, 5]])).not.toBeNull();
  });
  it("passes a concave L shape", () => {
    expect(selfIntersection([[0, 0], [10, 0], [10, 4], [4, 4], [4, 10], [0, 10]])).toBeNull();
  });
  it("passes a square", () => expect(selfIntersection(square)).toBeNull());
});

describe("an outline", () => {
  it("needs three points", () => {
    expect(polygonIssue([[0, 0], [1, 1]], "Area “A”")).toBe("Area “A”: the outline has 2 points; it needs at least 3.");
    expect(polygonIssue([], "Area “A”")).toContain("0 points");
  });
  it("must enclose an area", () => {
    expect(polygonIssue([[0, 0], [5, 0], [10, 0]], "Area “A”")).toBe("Area “A”: the outline encloses no area (its points lie on one line).");
  });
  it("must not repeat a point", () => {
    expect(polygonIssue([[0, 0], [5, 0], [5, 0], [5, 5]], "Area “A”")).toBe("Area “A”: points 2 and 3 are the same place (5, 0); remove one.");
  });
  it("names the crossing edges and where they meet", () => {
    expect(polygonIssue([[0, 0], [10, 10], [10, 0], [0, 10]], "Area “Bow”")).toBe("Area “Bow”: edge 1–2 meets edge 3–4 at (5, 5); an outline must not cross or touch itself.");
  });
  it("refuses coordinates that are not numbers or lie beyond 10 km, naming the point", () => {
    expect(polygonIssue([[0, 0], [Number.NaN, 0], [0, 5]], "Area “A”")).toBe("Area “A”, point 2: x is not a number.");
    expect(polygonIssue([[0, 0], [5, Number.POSITIVE_INFINITY], [0, 5]], "Area “A”")).toBe("Area “A”, point 2: y is not a number.");
    expect(polygonIssue([[0, 0], [5, 0], [0, 10_000.5]], "Area “A”")).toBe("Area “A”, point 3: y = 10000.5 m lies beyond ±10 000 m of the site's origin.");
    expect(polygonIssue([[0, 0], [5, 0], [0, 10_000]], "Area “A”")).toBeNull();
  });
});

describe("the whole layout", () => {
  it("accepts a sound layout", () => {
    const layout: LayoutGeometry = {
      surfaces: [area(square), area([[2, 2], [6, 2], [6, 6], [2, 6]], "Penthouse top", 4.2), facade([[0, -20], [30, -20]], -30, 0)],
      obstructions: [{ name: "Plant room", polygon: [[7, 7], [9, 7], [9, 9], [7, 9]], baseM: 0, heightM: 3 }],
      accessPoints: [{ name: "Roof door", x: 1, y: 1, z: 0 }],
    };
    expect(validateLayout(layout)).toEqual([]);
  });

  it("keys each refusal by its field and names the surface", () => {
    const issues = validateLayout({
      surfaces: [area(square), area([[0, 0], [1, 1]], "Lower roof"), facade([[0, 0], [0, 0]], 0, 5, "Street side"), facade([[0, 0], [10, 0]], 12, 3, "Balcony")],
    });
    expect(issuesByPath(issues)).toEqual({
      "surfaces[1].polygon": "Area “Lower roof”: the outline has 2 points; it needs at least 3.",
      "surfaces[2].line": "Facade “Street side”: both ends are at (0, 0); the segment has no length.",
      "surfaces[3].topM": "Facade “Balcony”: the top (3 m) must be above the bottom (12 m).",
    });
  });

  it("refuses a facade with a top equal to its bottom, and a segment of three points", () => {
    expect(issuesByPath(validateLayout({ surfaces: [facade([[0, 0], [5, 0]], 3, 3)] }))["surfaces[0].topM"]).toContain("must be above the bottom");
    expect(issuesByPath(validateLayout({ surfaces: [facade([[0, 0], [5, 0], [6, 0]])] }))["surfaces[0].line"]).toContain("2 points; it has 3");
  });

  it("refuses elevations that are not numbers or beyond ±1000 m", () => {
    const issues = issuesByPath(validateLayout({ surfaces: [area(square, "High", 1200), area(square, "Blank", Number.NaN)] }));
    expect(issues["surfaces[0].elevationM"]).toBe("Area “High”: the elevation = 1200 m lies beyond ±1 000 m of the site's datum.");
    expect(issues["surfaces[1].elevationM"]).toBe("Area “Blank”: the elevation is not a number.");
  });

  it("checks obstructions and access points too", () => {
    const issues = issuesByPath(
      validateLayout({
        surfaces: [],
        obstructions: [{ name: "Tank", polygon: [[0, 0], [2, 2], [2, 0], [0, 2]], baseM: 0, heightM: 0 }],
        accessPoints: [{ name: "Hatch", x: 20_000, y: 0, z: 0 }],
      }),
    );
    expect(issues["obstructions[0].polygon"]).toContain("Obstruction “Tank”: edge 1–2 meets edge 3–4 at (1, 1)");
    expect(issues["obstructions[0].heightM"]).toBe("Obstruction “Tank”: the height must be above 0 m.");
    expect(issues["accessPoints[0].x"]).toBe("Access point “Hatch”: x = 20000 m lies beyond ±10 000 m of the site's origin.");
  });

  it("calls an unnamed record by its place in the list", () => {
    expect(validateLayout({ surfaces: [area([[0, 0]], "  ")] })[0].message).toMatch(/^Area “1”/);
  });
});
