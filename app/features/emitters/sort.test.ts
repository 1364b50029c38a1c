import { describe, expect, it } from "vitest";
import { nextSort, sortRows } from "./sort";

type Row = { label: string; mhz: number };
const rows: Row[] = [
  { label: "S10", mhz: 700 },
  { label: "S2", mhz: 1900 },
  { label: "s1", mhz: 700 },
];
const label = { id: "label", value: (r: Row) => r.label };
const mhz = { id: "mhz", value: (r: Row) => r.mhz };

describe("emitter table sorting (common practice, no source: TanStack Table's default click order)", () => {
  it("clicks text through A→Z, Z→A, then the stored order", () => {
    const first = nextSort(null, label, rows);
    expect(first).toEqual({ id: "label", desc: false });
    expect(sortRows(rows, [label], first).map((r) => r.label)).toEqual(["s1", "S2", "S10"]);
    const second = nextSort(first, label, rows);
    expect(sortRows(rows, [label], second).map((r) => r.label)).toEqual(["S10", "S2", "s1"]);
    expect(nextSort(second, label, rows)).toBeNull();
  });

  it("clicks numbers largest first, keeping the stored order between equal values", () => {
    const first = nextSort(null, mhz, rows);
    expect(first).toEqual({ id: "mhz", desc: true });
    expect(sortRows(rows, [mhz], first).map((r) => r.label)).toEqual(["S2", "S10", "s1"]);
    expect(sortRows(rows, [mhz], nextSort(first, mhz, rows)).map((r) => r.label)).toEqual(["S10", "s1", "S2"]);
  });

  it("starts over on another column", () => {
    expect(nextSort({ id: "mhz", desc: true }, label, rows)).toEqual({ id: "label", desc: false });
    expect(sortRows(rows, [label], null)).toBe(rows);
  });
});
