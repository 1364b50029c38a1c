// The elevation view's numbers against the far-field formula S = EIRP/(4πR²) (FCC OET Bulletin 65,
// Edition 97-01, eq. (3)) and the FCC limits above 1500 MHz, 10 W/m² general population and
// 50 W/m² occupational (47 CFR §1.1310(e)(1), Table 1).
import { describe, expect, it } from "vitest";
import { percentAt, type EmitterInput } from "~/engine";
import { boundaryLines, emittersInCutFrame, preparedFor, sectionField, sectionMaximum } from "./section-field";
import { samplePoint, sectionGrid } from "./section-geometry";

// Isotropic, EIRP 1000π W: 10 W/m² (100 % general) at R = 5 m, 50 W/m² (100 % occupational) at √5 m.
const iso: EmitterInput = { id: "ISO", frequencyMHz: 1900, powerW: 1000 * Math.PI, gainDbi: 0, position: { x: 10, y: 0, z: 0 } } as EmitterInput;

describe("section field", () => {
  const cut = { a: [0, 0] as [number, number], b: [20, 0] as [number, number] };
  const g = sectionGrid(cut, -8, 8, { minStep: 0.25, maxCols: 1000, maxRows: 1000 });
  const field = sectionField([iso], "fcc", g);
  const at = (s: number, z: number) => Math.round(s / g.step) + g.ns * Math.round((z - g.z0) / g.step);

  it("gives 100 % of the general limit 5 m from the emitter and 400 % at 2.5 m, whichever way", () => {
    expect(field.general[at(15, 0)]).toBeCloseTo(100, 6); // 5 m east
    expect(field.general[at(10, 5)]).toBeCloseTo(100, 6); // 5 m above
    expect(field.general[at(13, 4)]).toBeCloseTo(100, 6); // 3-4-5
    expect(field.general[at(7.5, 0)]).toBeCloseTo(400, 6); // 2.5 m west: (5/2.5)² × 100 %
    expect(field.occupational[at(15, 0)]).toBeCloseTo(20, 6); // 10/50 of the general percentage
  });

  it("draws each tier's 100 % boundary as a circle of radius 5 m and √5 m around the emitter", () => {
    const lines = boundaryLines(field, g);
    for (const { tier, lines: rings } of lines) {
      const r = tier === "general" ? 5 : Math.sqrt(5);
      const points = rings.flat();
      expect(points.length).toBeGreaterThan(20);
      // Linear interpolation between samples a quarter metre apart: within 3 cm of the true radius.
      for (const [s, z] of points) expect(Math.abs(Math.hypot(s - 10, z) - r)).toBeLessThan(0.03);
    }
  });

  it("finds the maximum at the sample nearest the emitter", () => {
    const m = sectionMaximum(field.general, g);
    expect(m.s).toBeCloseTo(10, 9);
    expect(m.z).toBeCloseTo(0, 9);
  });
});

describe("the cut's frame", () => {
  // A directional, tilted, near-field emitter: the rotation must keep every angle off boresight.
  const panel = { id: "P", frequencyMHz: 2130, powerW: 160, lossDb: 1, gainDbi: 17.5, position: { x: 3, y: -2, z: 2.5 }, azimuthDeg: 70, tiltDeg: 4, model: "auto", apertureM: 1.4,
    pattern: { type: "3gpp-38.901", hBeamwidthDeg: 65, vBeamwidthDeg: 7 } } as EmitterInput;
  const dish = { id: "D", frequencyMHz: 1900, powerW: 20, gainDbi: 14, position: { x: -4, y: 6, z: 1 }, azimuthDeg: 300, tiltDeg: -5,
    pattern: { type: "itu-r-f.1336-sectoral", hBeamwidthDeg: 90, vBeamwidthDeg: 10 } } as EmitterInput;

  it("gives at each sample the value the engine gives at the same point in site coordinates (rotation about the vertical, common practice)", () => {
    const g = sectionGrid({ a: [-6, -9], b: [14, 12] }, -2, 8, { minStep: 0.5 });
    const field = sectionField([panel, dish], "fcc", g);
    const direct = preparedFor([panel, dish], "fcc").general;
    for (const [i, k] of [[0, 0], [10, 5], [25, 9], [g.ns - 1, g.nz - 1], [40, 12]]) {
      const [x, y, z] = samplePoint(g, i, k);
      const want = direct.reduce((sum, pe) => sum + percentAt(pe, x, y, z), 0);
      expect(field.general[k * g.ns + i] / want).toBeCloseTo(1, 6);
    }
  });

  it("puts an emitter on the cut at y = 0 and its boresight along the cut at 90°", () => {
    const g = sectionGrid({ a: [0, 0], b: [10, 10] }, 0, 5);
    const [e] = emittersInCutFrame([{ ...panel, position: { x: 5, y: 5, z: 2 }, azimuthDeg: 45 }], g);
    expect(e.position.x).toBeCloseTo(Math.hypot(5, 5), 9);
    expect(e.position.y).toBeCloseTo(0, 9);
    expect(e.azimuthDeg).toBeCloseTo(90, 9);
  });
});
