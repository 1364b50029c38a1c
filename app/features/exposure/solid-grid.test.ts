// The 3D view's grid and iso-surface input: node layout and values against the engine's own point
// function, and the extracted 100 % surfaces against the far-field radii R = √(EIRP/(4π·S_lim))
// (FCC OET Bulletin 65, Edition 97-01, eq. (4); 47 CFR §1.1310(e)(1) Table 1: 10 and 50 W/m² above 1500 MHz).
import { describe, expect, it } from "vitest";
import { percentAt, type EmitterInput } from "~/engine";
import { preparedFor } from "./section-field";
import { solidMeshes } from "./solid-mesh";
import { isoPotential, solidBox, solidField, solidGrid, toSitePositions } from "./solid-grid";

const iso: EmitterInput = { id: "ISO", frequencyMHz: 1900, powerW: 1000 * Math.PI, gainDbi: 0, position: { x: 2, y: 3, z: 4 } } as EmitterInput;

describe("3D grid", () => {
  it("grows the box around the antennas by the reach, capped, and never below the floor", () => {
    expect(solidBox([iso], 5, -1)).toEqual({ minX: -4, minY: -3, minZ: -1, maxX: 8, maxY: 9, maxZ: 10 }); // 5·1.1 + 0.5 = 6 m
    expect(solidBox([iso], 100, -50, { capM: 30 }).maxX).toBe(32);
  });

  it("keeps the node count within the cap with a round step", () => {
    const g = solidGrid({ minX: 0, minY: 0, minZ: 0, maxX: 40, maxY: 30, maxZ: 12 }, { minStep: 0.25, maxNodes: 100_000 });
    expect(g.step).toBeCloseTo(0.55, 9); // ∛(14 400 / 100 000) = 0.524 → 0.55
    expect(g.nx * g.ny * g.nz).toBeLessThanOrEqual(100_000 * 1.2); // one node past each far side
    expect(g.x0 + (g.nx - 1) * g.step).toBeGreaterThanOrEqual(40);
  });

  it("stores node (i, j, k) at i + nx·(j + ny·k) with the engine's value there, for both tiers", () => {
    const g = solidGrid(solidBox([iso], 5, -10), { minStep: 0.5 });
    const f = solidField([iso], "fcc", g);
    const pe = preparedFor([iso], "fcc");
    for (const [i, j, k] of [[0, 0, 0], [3, 7, 5], [g.nx - 1, g.ny - 1, g.nz - 1], [12, 12, 12]]) {
      const at = i + g.nx * (j + g.ny * k);
      const [x, y, z] = [g.x0 + i * g.step, g.y0 + j * g.step, g.z0 + k * g.step];
      expect(f.general[at]).toBeCloseTo(percentAt(pe.general[0], x, y, z), 3);
      // Above 1500 MHz the FCC occupational limit is five times the general one (50 vs 10 W/m²).
      expect(f.occupational[at]).toBeCloseTo(percentAt(pe.general[0], x, y, z) / 5, 3);
    }
  });

  it("gives the extractor log10(%/100): positive inside the boundary, zero on it, outside on the box's faces", () => {
    const g = { nx: 3, ny: 3, nz: 3, step: 1, x0: 0, y0: 0, z0: 0 };
    const values = new Float32Array(27).fill(50);
    values[13] = 1000; // the centre node
    const f = isoPotential(values, g);
    expect(f(1, 1, 1)).toBeCloseTo(1, 6);
    expect(f(0, 1, 1)).toBe(-1);
    values[13] = 100;
    expect(f(1, 1, 1)).toBeCloseTo(0, 6);
  });

  it("maps extractor nodes to site metres, three vertices a triangle", () => {
    const g = { nx: 3, ny: 3, nz: 3, step: 0.5, x0: 10, y0: 20, z0: -1 };
    expect(Array.from(toSitePositions([[0, 0, 0], [2, 0, 0], [0, 2, 2]], [[0, 1, 2]], g))).toEqual([10, 20, -1, 11, 20, -1, 10, 21, 0]);
  });

  it("extracts the 100 % surfaces as spheres of radius 5 m (general) and √5 m (occupational)", () => {
    const m = solidMeshes([iso], "fcc", -10, { minStep: 0.25, maxNodes: 200_000 });
    for (const [positions, r] of [[m.general, 5], [m.occupational, Math.sqrt(5)]] as const) {
      expect(positions.length).toBeGreaterThan(900);
      let worst = 0;
      for (let v = 0; v < positions.length; v += 3) {
        const d = Math.hypot(positions[v] - 2, positions[v + 1] - 3, positions[v + 2] - 4);
        worst = Math.max(worst, Math.abs(d - r));
      }
      // Within a tenth of the step: interpolating log10 along the cell edges follows 1/R² closely.
      expect(worst).toBeLessThan(0.1 * m.grid.step);
    }
  });
});
