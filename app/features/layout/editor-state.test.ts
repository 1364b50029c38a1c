// The editor's working copy: text to numbers, levels, error paths back to records, picking on the plan.
import { describe, expect, it } from "vitest";
import { elevationLabel, insideOutline, itemAt, itemOfPath, layoutFromItems, levelsOf, problemsOf, type LayoutItem } from "./editor-state";

const roof: LayoutItem = { key: "a", type: "area", name: "Main roof", polygon: [["0", "0"], ["20", "0"], ["20", "12"], ["0", "12"]], elevationM: "0", access: "public" };
const top: LayoutItem = { key: "b", type: "area", name: "Penthouse top", polygon: [["2", "2"], ["6", "2"], ["6", "5"], ["2", "5"]], elevationM: "4,2", access: "workers" };
const door: LayoutItem = { key: "c", type: "access", name: "Door", kind: "door", x: "1", y: "1", z: "0", locked: false };

describe("the editor's working copy", () => {
  it("reads typed numbers, a decimal comma included, into the API's layout", () => {
    const { input, keys } = layoutFromItems([roof, top, door], { version: 3 });
    expect(input.version).toBe(3);
    expect(input.surfaces[1]).toMatchObject({ kind: "area", elevationM: 4.2 });
    expect(input.accessPoints).toEqual([{ name: "Door", kind: "door", x: 1, y: 1, z: 0, locked: false }]);
    expect(keys).toEqual({ surfaces: ["a", "b"], obstructions: [], accessPoints: ["c"] });
    expect(itemOfPath("surfaces[1].polygon", keys)).toEqual({ key: "b", field: "polygon" });
    expect(itemOfPath("accessPoints[0].x", keys)).toEqual({ key: "c", field: "x" });
  });

  it("groups areas into levels, highest first", () => {
    expect(levelsOf([roof, top]).map((l) => [elevationLabel(l.elevation), l.items.map((i) => i.name)])).toEqual([["+4.2 m", ["Penthouse top"]], ["0.0 m", ["Main roof"]]]);
    expect(elevationLabel(-3.5)).toBe("−3.5 m");
  });

  it("finds the problems of each record, a half-typed number included", () => {
    const problems = problemsOf([{ ...roof, polygon: [["0", "0"], ["-", "0"], ["0", "5"]] }, { ...door, name: " " }]);
    expect(problems.get("a")).toEqual([{ field: "polygon", message: "Area “Main roof”, point 2: x is not a number." }]);
    expect(problems.get("c")?.[0].message).toBe("Access point: enter a name.");
  });

  it("picks the record under a click: a point first, then the highest area", () => {
    expect(itemAt([roof, top, door], [1.2, 1.1], 0.5)).toBe("c");
    expect(itemAt([roof, top, door], [4, 3], 0.5)).toBe("b");
    expect(itemAt([roof, top, door], [15, 10], 0.5)).toBe("a");
    expect(itemAt([roof, top, door], [30, 30], 0.5)).toBeNull();
    expect(insideOutline([[0, 0], [10, 0], [10, 4], [4, 4], [4, 10], [0, 10]], [8, 8])).toBe(false);
  });
});
