// The page's plain numbers and the order of the level plans.
import { describe, expect, it } from "vitest";
import { lean, levelsOf, type AreaView } from "./exposure-result";

describe("lean numbers", () => {
  it("rounds to three significant figures like toPrecision(3), and drops values below 0.01 % (common practice, no source)", () => {
    for (const v of [0.012345, 0.5, 1.2345, 12.345, 99.95, 123.45, 4576.52, 98765.4, 1e6 + 0.3]) expect(lean(v)).toBe(Number(v.toPrecision(3)));
    expect(lean(0.009)).toBe(0);
    expect(lean(Number.NaN)).toBe(0);
  });
});

describe("levelsOf", () => {
  const area = (name: string, elevationM: number, totalM2: number) => ({ surfaceId: name, name, elevationM, areas: { totalM2 } }) as unknown as AreaView;
  it("puts the largest level first, then the others from the top down, one plan per elevation", () => {
    const levels = levelsOf([area("penthouse", 4.2, 120), area("main", 0, 1120), area("wing", -3.5, 288), area("kiosk", 0, 10)]);
    expect(levels.map((l) => l.elevationM)).toEqual([0, 4.2, -3.5]);
    expect(levels[0].areas.map((a) => a.name)).toEqual(["main", "kiosk"]);
  });
});
