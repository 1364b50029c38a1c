// The fast what-if (per-emitter layers, re-weighted) gives what the whole computation gives for the
// same edits: the same worst point, classes and areas, and the same values to three figures.
import { describe, expect, it } from "vitest";
import type { InventoryEmitter } from "./engine-inputs";
import { computeExposure, type ExposureInput } from "./exposure-result";
import { optionsSchema } from "./options";
import type { WhatIfEdits } from "./what-if";
import { createWhatIfModel } from "./what-if-model";

const emitter = (id: string, over: Partial<InventoryEmitter>): InventoryEmitter => ({
  id, label: id, frequencyMHz: 1900, powerPerCarrierW: 40, carriers: 2, lossDb: 1, gainDbi: 15, patternId: null, pattern: null, hBeamwidthDeg: 65, vBeamwidthDeg: 10,
  azimuthDeg: 90, mechanicalTiltDeg: 0, electricalTiltDeg: 2, x: 0, y: 5, z: 2, model: null, apertureM: null, dishDiameterM: null, dutyFactor: 1, actualMaxFactor: 1, tddFactor: 1, active: true, ...over,
});
const input = (mode: "average" | "max"): ExposureInput => ({
  options: optionsSchema.parse({ standard: "fcc", tier: "general", gridStepM: 0.5, mode }),
  surfaces: [
    { id: "roof", name: "Roof", kind: "area", polygon: [[0, 0], [16, 0], [16, 10], [0, 10]], line: null, elevationM: 0, bottomM: null, topM: null, access: "workers" },
    { id: "wall", name: "Wall", kind: "facade", polygon: null, line: [[20, 0], [20, 10]], elevationM: null, bottomM: -4, topM: 3, access: "public" },
  ],
  emitters: [
    emitter("A", { powerPerCarrierW: 60 }),
    emitter("B", { frequencyMHz: 739, x: 16, y: 2, azimuthDeg: 300, model: "cylindrical", apertureM: 2 }),
    emitter("C", { x: 8, y: 10, azimuthDeg: 180, active: false }),
  ],
  patterns: [],
  readings: [{ id: "r1", label: "R1", visitId: "v", visitedOn: "2026-11-20", surfaceId: "roof", x: 4, y: 5, heightM: 1.5, value: 3, unit: "W/m2", frequencyMHz: null, powerDensityWm2: 3, percentStandard: null, percentTier: null }],
});

const cases: [string, WhatIfEdits][] = [
  ["nothing", {}],
  ["A off", { A: { off: true } }],
  ["B at +6 dB", { B: { powerDb: 6 } }],
  ["A turned and tilted", { A: { azimuthDeg: 45, tiltDeg: 8 } }],
];

describe("what-if model", () => {
  const i = input("average");
  const model = createWhatIfModel(i);
  model.prime();
  for (const [name, edits] of cases) {
    it(`matches the whole computation: ${name}`, () => {
      const fast = model.compute(edits);
      const slow = computeExposure(i, edits);
      expect(fast.summary.worstAt).toEqual(slow.summary.worstAt);
      expect(fast.summary.worstPercent).toBeCloseTo(slow.summary.worstPercent, 4);
      const [a, b] = [fast.areas[0], slow.areas[0]];
      expect(a.classes).toEqual(b.classes);
      expect(a.areas).toEqual(b.areas);
      for (let c = 0; c < a.percent.length; c++) expect(Math.abs(a.percent[c] - b.percent[c])).toBeLessThanOrEqual(Math.abs(b.percent[c]) * 0.005 + 0.01);
      expect(a.contributions.map((c) => c.id)).toEqual(b.contributions.map((c) => c.id));
      a.contributions.forEach((c, k) => expect(c.percent).toBeCloseTo(b.contributions[k].percent, 4));
      const [f, g] = [fast.facades[0], slow.facades[0]];
      expect(f.classes).toEqual(g.classes);
      expect(f.areas).toEqual(g.areas);
      expect(f.worstAt).toEqual(g.worstAt);
      expect(f.worstPercent).toBeCloseTo(g.worstPercent, 4);
      for (let c = 0; c < f.percent.length; c++) expect(Math.abs(f.percent[c] - g.percent[c])).toBeLessThanOrEqual(Math.abs(g.percent[c]) * 0.005 + 0.01);
      expect(fast.readings).toEqual(slow.readings);
      expect(fast.emitters).toEqual(slow.emitters);
    });
  }

  it("switching the dominant emitter off lowers the worst point", () => {
    const before = model.compute({}).summary.worstPercent;
    const after = model.compute({ A: { off: true } }).summary.worstPercent;
    expect(after).toBeLessThan(before);
  });

  it("with the maximum over the heights, every edit runs the whole computation", () => {
    const m = input("max");
    const slowModel = createWhatIfModel(m);
    expect(slowModel.linear).toBe(false);
    expect(slowModel.compute({ A: { off: true } })).toEqual(computeExposure(m, { A: { off: true } }));
  });
});
