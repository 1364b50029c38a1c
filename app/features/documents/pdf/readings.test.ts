// The report's readings against predictions: each reading is compared with the prediction at its own
// point and height, as the Exposure page does (features/exposure/readings.ts), not with the grid
// cell's spatial average over 0–2 m. The predictions here come from the engine itself.
import { describe, expect, it } from "vitest";
import { evaluate, type EvaluationRequestInput } from "~/engine";
import type { Run } from "~/features/exposure/evaluate-site";
import type { ExposureOptions } from "~/features/exposure/options";
import { readingRows } from "./readings";
import type { SourceAssessment, SourceReading } from "./source";

// A narrow-beam sector 1.5 m above a roof at 10 m, pointing east (invented figures).
const emitter = { id: "S1", frequencyMHz: 1960, powerW: 120, lossDb: 1, gainDbi: 17, position: { x: 1, y: 5, z: 11.5 }, azimuthDeg: 90, tiltDeg: 0, pattern: { type: "itu-r-f.1336-sectoral" as const, hBeamwidthDeg: 65, vBeamwidthDeg: 7 } };
const options = { standard: "fcc", tier: "general", gridStepM: 0.5, heights: { fromM: 0, toM: 2, count: 11 }, mode: "average", reflectionFactor: 1, defaultModel: "spherical" } as unknown as ExposureOptions;
const polygon: [number, number][] = [[0, 0], [20, 0], [20, 10], [0, 10]];
const gridRequest: EvaluationRequestInput = { standard: "fcc", tier: "general", emitters: [emitter], grid: { x0: 0.25, y0: 0.25, x1: 19.75, y1: 9.75, step: 0.5, z0: 10, z1: 12, zCount: 11, mode: "average", polygons: [polygon] } };
const run: Run = { surfaceId: "roof", request: gridRequest, response: evaluate(gridRequest) };
const assessment: Pick<SourceAssessment, "options" | "runs" | "inventory"> = {
  options,
  runs: [run],
  inventory: { surfaces: [{ id: "roof", name: "Main roof", kind: "area", polygon, access: "workers", elevationM: 10 }], emitters: [], obstructions: [], accessPoints: [] },
};
const pointPrediction = (x: number, y: number, z: number) => evaluate({ standard: "fcc", tier: "general", emitters: [emitter], points: [{ x, y, z }] }).points![0].totalPercent;
const reading = (over: Partial<SourceReading>): SourceReading => ({ id: "r", visitId: "v", label: "R", surfaceId: "roof", x: 6.25, y: 5.25, heightM: 1.5, value: 0, unit: "percent", powerDensityWm2: null, percentStandard: "fcc", percentTier: "general", frequencyMHz: null, visitedOn: "2026-05-01", ...over });

describe("readingRows", () => {
  it("takes the prediction at the reading's own point and height, so a reading in the beam is not called above its average", () => {
    const atPoint = pointPrediction(6.25, 5.25, 11.5);
    const g = run.response.grid!;
    const cell = g.percent[Math.round((5.25 - g.y0) / g.step) * g.nx + Math.round((6.25 - g.x0) / g.step)];
    // In the beam at 1.5 m the point value is well above the 0–2 m average of the cell: the old comparison's trap.
    expect(atPoint).toBeGreaterThan(1.5 * cell);
    const below = 0.9 * atPoint;
    expect(below).toBeGreaterThan(cell);
    const [row] = readingRows(assessment, [reading({ value: below })]);
    expect(row.predicted).toBeCloseTo(atPoint, 9);
    expect(row.above).toBe(false);
    const [over] = readingRows(assessment, [reading({ value: 1.1 * atPoint })]);
    expect(over.above).toBe(true);
  });

  it("adds the surface's elevation to the reading's height, and compares power density readings at their frequency's limit", () => {
    const atPoint = pointPrediction(8.25, 5.25, 10.5);
    // FCC general population at 1960 MHz: 1 mW/cm² = 10 W/m² (47 CFR §1.1310(e), Table 1, f ≥ 1500 MHz).
    const wm2 = (0.5 * atPoint * 10) / 100;
    const [row] = readingRows(assessment, [reading({ x: 8.25, heightM: 0.5, unit: "W/m²", value: wm2, powerDensityWm2: wm2, percentStandard: null, percentTier: null, frequencyMHz: 1960 })]);
    expect(row.basis).toBe("power density");
    expect(row.predicted).toBeCloseTo(atPoint, 9);
    expect(row.percent).toBeCloseTo(0.5 * atPoint, 9);
    expect(row.above).toBe(false);
  });

  it("leaves a reading in another standard's % uncompared", () => {
    const [row] = readingRows(assessment, [reading({ value: 5000, percentStandard: "icnirp2020" })]);
    expect(row).toMatchObject({ basis: "not comparable", percent: null, above: false });
  });
});
