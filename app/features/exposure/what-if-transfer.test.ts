// Areas sent as typed arrays come back as the same plain values (common practice, no source).
import { describe, expect, it } from "vitest";
import type { AreaView } from "./exposure-result";
import { packAreas, unpackAreas } from "./what-if-transfer";

const area = (id: string, percent: number[], classes: number[]) =>
  ({ surfaceId: id, name: id, elevationM: 0, polygon: [[0, 0], [1, 0], [1, 1]], grid: { nx: percent.length, ny: 1, x0: 0, y0: 0, step: 0.25 }, percent, classes, worstPercent: 1234, worstAt: null, worstClass: 3, areas: { totalM2: 1, withinGeneralM2: 0, overGeneralM2: 1, overOccupationalM2: 1, overTenTimesOccupationalM2: 1 }, contributions: [] }) as AreaView;

describe("what-if transfer", () => {
  const areas = [area("a", [0, 0.0123, 1.23e-5, 987, 1234.5678, -0], [255, 0, 1, 2, 3, 255]), area("b", [], [])];

  it("packs the grids as typed arrays and lists their buffers", () => {
    const { areas: packed, transfer } = packAreas(areas);
    expect(packed[0].percent).toBeInstanceOf(Float64Array);
    expect(packed[0].classes).toBeInstanceOf(Uint8Array);
    expect(transfer).toHaveLength(4);
    expect(areas[0].percent).toBeInstanceOf(Array); // the input untouched
  });

  it("unpacks to the same values, plain arrays read on first use", () => {
    const { areas: packed } = packAreas(areas);
    const back = unpackAreas(structuredClone(packed));
    expect(back[0].name).toBe("a");
    expect(Array.isArray(back[0].percent)).toBe(true);
    expect(back).toEqual(areas);
    expect(JSON.stringify(back)).toBe(JSON.stringify(areas));
    expect(back[0].percent).toBe(back[0].percent); // converted once
    expect(Object.is(back[0].percent[5], -0)).toBe(true);
  });
});
