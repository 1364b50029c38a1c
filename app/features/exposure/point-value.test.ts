// The value under the pointer: the grid's own column average, from the engine in the browser.
import { describe, expect, it } from "vitest";
import { evaluate, type EmitterInput } from "~/engine";
import { optionsSchema } from "./options";
import { pointValue } from "./point-value";

const iso = (id: string, powerW: number, x: number): EmitterInput => ({ id, frequencyMHz: 1900, powerW, lossDb: 0, gainDbi: 0, position: { x, y: 0, z: 1 }, azimuthDeg: 0, tiltDeg: 0, pattern: "isotropic", model: "spherical", reflectionFactor: 1, dutyFactor: 1 });
const emitters = [iso("big", 4000, 0), iso("mid", 1000, 0), iso("small", 100, 0), iso("tiny", 10, 0)];

describe("pointValue", () => {
  it("agrees with the engine's grid at the same point and heights (spatial average over 0–2 m)", () => {
    const o = optionsSchema.parse({ standard: "fcc", tier: "general", heights: { fromM: 0, toM: 2, count: 5 } });
    const grid = evaluate({ standard: "fcc", tier: "general", emitters, grid: { x0: 3, y0: 0, x1: 3, y1: 0, step: 1, z0: 0, z1: 2, zCount: 5 } }).grid!;
    const v = pointValue(emitters, o, 3, 0, 0);
    expect(v.totalPercent).toBeCloseTo(grid.percent[0], 4);
  });

  it("lists the three largest contributors, largest first (power ratios 40 : 10 : 1 : 0.1)", () => {
    const o = optionsSchema.parse({ standard: "fcc", tier: "general", heights: { fromM: 1, toM: 1, count: 1 } });
    const v = pointValue(emitters, o, 5, 0, 0);
    expect(v.top.map((t) => t.id)).toEqual(["big", "mid", "small"]);
    // Same distance, so shares follow power: S = P/(4πR²) (FCC OET Bulletin 65, eq. (3)).
    expect(v.top[0].percent / v.top[1].percent).toBeCloseTo(4, 6);
  });
});
