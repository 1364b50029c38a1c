import { describe, expect, it } from "vitest";
import { gridAxes, pointInPolygon } from "./axes";
import { EngineInputError } from "./errors";
import { evaluate, evaluateParsed, parseRequest, prepareRequest } from "./evaluate";
import { percentAt } from "./kernel";
import { responseSchema, type EvaluationRequestInput } from "./schema";

const sector = (h: number, v: number) => ({ type: "3gpp-38.901" as const, hBeamwidthDeg: h, vBeamwidthDeg: v, maxAttenuationDb: 30, sideLobeDb: 30 });

function site(tilt = 0, vBw = 7): EvaluationRequestInput {
  return {
    standard: "fcc",
    tier: "general",
    emitters: [
      { id: "A", frequencyMHz: 1900, powerW: 120, lossDb: 1.5, gainDbi: 15, position: { x: 5, y: 5, z: 1.5 }, azimuthDeg: 60, tiltDeg: tilt, pattern: sector(65, vBw) },
      { id: "B", frequencyMHz: 700, powerW: 80, lossDb: 1, gainDbi: 13, position: { x: 15, y: 8, z: 1.2 }, azimuthDeg: 250, tiltDeg: tilt, pattern: sector(65, 10) },
      { id: "C", frequencyMHz: 3500, powerW: 40, gainDbi: 5, position: { x: 10, y: 2, z: 4 } },
    ],
    grid: { x0: 0, y0: 0, x1: 20, y1: 10, step: 0.5, z0: 0, z1: 2, zCount: 5, mode: "average" },
  };
}

describe("grid axes (as peer_grid.py: numpy.arange(x0, x1 + 1e-9, step), numpy.linspace(z0, z1, zCount))", () => {
  it("endpoints included; 0–60 m at 0.25 m is 241 points; heights evenly spaced", () => {
    const a = gridAxes({ x0: 0, y0: 0, x1: 60, y1: 40, step: 0.25, z0: 0, z1: 2, zCount: 11 });
    expect([a.nx, a.ny, a.nz]).toEqual([241, 161, 11]);
    expect(a.xs[240]).toBe(60);
    expect(Array.from(a.zs)).toEqual([0, 0.2, 0.4, 0.6000000000000001, 0.8, 1, 1.2000000000000002, 1.4000000000000001, 1.6, 1.8, 2]);
    expect(gridAxes({ x0: 0, y0: 0, x1: 1, y1: 0, step: 0.3, z0: 1.5, zCount: 1 })).toMatchObject({ nx: 4, ny: 1, nz: 1 });
    expect(gridAxes({ x0: 0, y0: 0, x1: 1, y1: 0, step: 0.3, z0: 1.5, zCount: 1 }).zs[0]).toBe(1.5);
  });
});

describe("grid kernel agrees with the point-by-point reference", () => {
  for (const [tilt, vBw] of [[0, 7], [8, 7], [0, 65], [8, 65]]) {
    it(`tilt ${tilt}°, vertical beamwidth ${vBw}°: every cell within 1e-6 relative of the mean of percentAt over the heights`, () => {
      const r = parseRequest(site(tilt, vBw));
      if (!r.ok) throw new Error(r.message);
      const res = evaluateParsed(r.request);
      const p = prepareRequest(r.request);
      const a = gridAxes(r.request.grid!);
      for (let j = 0; j < a.ny; j++)
        for (let i = 0; i < a.nx; i++) {
          let s = 0;
          for (let k = 0; k < a.nz; k++) for (const pe of p.prepared) s += percentAt(pe, a.xs[i], a.ys[j], a.zs[k]);
          s /= a.nz;
          const got = res.grid!.percent[j * a.nx + i];
          expect(Math.abs(got - s)).toBeLessThanOrEqual(1e-6 * s + 1e-6);
        }
    });
  }
  it("max mode is the maximum over heights", () => {
    const req = site();
    req.grid!.mode = "max";
    const r = parseRequest(req);
    if (!r.ok) throw new Error(r.message);
    const res = evaluateParsed(r.request);
    const p = prepareRequest(r.request);
    const a = gridAxes(r.request.grid!);
    const i = 7;
    const j = 9;
    let m = 0;
    for (let k = 0; k < a.nz; k++) {
      let s = 0;
      for (const pe of p.prepared) s += percentAt(pe, a.xs[i], a.ys[j], a.zs[k]);
      m = Math.max(m, s);
    }
    expect(res.grid!.percent[j * a.nx + i]).toBeCloseTo(m, 5);
    expect(res.grid!.maxPercent).toBeGreaterThanOrEqual(Math.max(...res.grid!.percent) - 1e-6);
  });
});

describe("response", () => {
  it("is deterministic and validates against responseSchema", () => {
    const a = JSON.stringify(evaluate(site(4)));
    const b = JSON.stringify(evaluate(site(4)));
    expect(a).toBe(b);
    expect(responseSchema.safeParse(JSON.parse(a)).success).toBe(true);
  });
  it("maxPercent and maxAt locate the hottest cell", () => {
    const r = evaluate(site());
    const g = r.grid!;
    const idx = g.percent.indexOf(Math.max(...g.percent));
    expect(g.maxAt).toEqual({ x: g.x0 + (idx % g.nx) * g.step, y: g.y0 + Math.floor(idx / g.nx) * g.step });
  });
});

describe("polygons, classification and contours", () => {
  it("point in polygon (even–odd rule)", () => {
    const sq: [number, number][] = [[0, 0], [2, 0], [2, 2], [0, 2]];
    expect(pointInPolygon(1, 1, sq)).toBe(true);
    expect(pointInPolygon(3, 1, sq)).toBe(false);
    const l: [number, number][] = [[0, 0], [4, 0], [4, 1], [1, 1], [1, 4], [0, 4]];
    expect(pointInPolygon(2, 2, l)).toBe(false);
    expect(pointInPolygon(0.5, 3, l)).toBe(true);
  });
  it("cells outside every polygon are masked (0, mask 0) and ignored by maxPercent", () => {
    const req = site();
    req.grid!.polygons = [[[12, -1], [21, -1], [21, 11], [12, 11]]];
    const g = evaluate(req).grid!;
    const full = evaluate(site()).grid!;
    for (let c = 0; c < g.percent.length; c++) {
      const x = g.x0 + (c % g.nx) * g.step;
      if (x < 12) {
        expect(g.mask![c]).toBe(0);
        expect(g.percent[c]).toBe(0);
      } else if (x > 12) {
        expect(g.mask![c]).toBe(1);
        expect(g.percent[c]).toBeCloseTo(full.percent[c], 9);
      }
    }
    expect(g.maxAt!.x).toBeGreaterThanOrEqual(12);
  });
  it("classes: 0 under the general limit, 1 between, 2 over the occupational limit", () => {
    const req = site();
    req.grid!.classify = true;
    const g = evaluate(req).grid!;
    const occ = evaluate({ ...site(), tier: "occupational" }).grid!;
    for (let c = 0; c < g.percent.length; c++) {
      const want = occ.percent[c] > 100 ? 2 : g.percent[c] > 100 ? 1 : 0;
      if (Math.abs(occ.percent[c] - 100) > 1e-4 && Math.abs(g.percent[c] - 100) > 1e-4) expect(g.classes![c]).toBe(want);
    }
    expect(new Set(g.classes)).toEqual(new Set([0, 1, 2]));
  });
  it("the 100 % contour of one isotropic emitter is the circle of its compliance distance", () => {
    const r = evaluate({
      standard: "fcc",
      tier: "general",
      emitters: [{ id: "o", frequencyMHz: 1900, powerW: 1000, gainDbi: 0, position: { x: 0, y: 0, z: 0 } }],
      grid: { x0: -10, y0: -10, x1: 10, y1: 10, step: 0.1, z0: 0, zCount: 1, contours: [100, 50] },
    });
    const rc = r.emitters[0].complianceDistanceM;
    const [c100, c50] = r.grid!.contours!;
    expect(c100.lines.length).toBe(1);
    for (const [x, y] of c100.lines[0]) expect(Math.abs(Math.hypot(x, y) - rc)).toBeLessThan(0.02);
    for (const [x, y] of c50.lines[0]) expect(Math.abs(Math.hypot(x, y) - rc * Math.SQRT2)).toBeLessThan(0.02);
  });
});

describe("work-area planner", () => {
  const req = (): EvaluationRequestInput => ({
    ...site(),
    workArea: { polygon: [[3, 3], [9, 3], [9, 8], [3, 8]] },
  });
  it("brings the work area's maximum to at most 100 %, verified by re-evaluating with the planned powers", () => {
    const r = evaluate(req());
    const wa = r.workArea!;
    expect(wa.maxPercentBefore).toBeGreaterThan(100);
    expect(wa.feasible).toBe(true);
    expect(wa.maxPercentAfter).toBeLessThanOrEqual(100);
    expect(wa.changes.length).toBeGreaterThan(0);
    const again = site();
    for (const ch of wa.changes) {
      const e = again.emitters.find((x) => x.id === ch.id)!;
      e.powerW *= ch.powerFactor;
      if (ch.reductionDb !== null) expect(ch.reductionDb).toBeCloseTo(-10 * Math.log10(ch.powerFactor), 9);
      expect(ch.switchOff).toBe(ch.powerFactor === 0);
    }
    again.grid!.polygons = [[[3, 3], [9, 3], [9, 8], [3, 8]]];
    expect(evaluate(again).grid!.maxPercent).toBeLessThanOrEqual(100 + 1e-6);
  });
  it("is infeasible when only emitters that are not adjustable cause the excess", () => {
    const r = req();
    r.workArea!.adjustable = ["C"];
    const wa = evaluate(r).workArea!;
    expect(wa.feasible).toBe(false);
  });
  it("rejects a polygon with no grid cell inside", () => {
    const r = req();
    r.workArea!.polygon = [[100, 100], [101, 100], [101, 101]];
    expect(() => evaluate(r)).toThrow(EngineInputError);
  });
});

// The cylindrical model and its vertical extent: FCC OET Bulletin 65 (1997) §2, eqs. (3)–(4); the
// crossover R* = G·h/2 where the cylindrical and spherical values meet is derived from them (from memory of IEC 62232).
describe("models in the grid", () => {
  it("cylindrical applies within the aperture's vertical extent, spherical outside it", () => {
    const e = { id: "c", frequencyMHz: 1900, powerW: 100, gainDbi: 10, position: { x: 0, y: 0, z: 10 }, model: "cylindrical" as const, apertureM: 2 };
    const r = evaluate({ standard: "fcc", tier: "general", emitters: [e], points: [{ x: 5, y: 0, z: 10.9 }, { x: 5, y: 0, z: 12 }] });
    expect(r.points![0].contributions[0].powerDensityWm2).toBeCloseTo(100 / (2 * Math.PI * 5 * 2), 9);
    expect(r.points![1].contributions[0].powerDensityWm2).toBeCloseTo(1000 / (4 * Math.PI * 29), 9);
  });
  it("auto switches from cylindrical to spherical at R* = G·h/2 and is continuous there", () => {
    const e = { id: "c", frequencyMHz: 1900, powerW: 100, gainDbi: 10, position: { x: 0, y: 0, z: 0 }, model: "auto" as const, apertureM: 2 };
    const pts = [9.999, 10.001].map((x) => ({ x, y: 0, z: 0 }));
    const [a, b] = evaluate({ standard: "fcc", tier: "general", emitters: [e], points: pts }).points!;
    expect(a.totalPercent / b.totalPercent).toBeCloseTo(1, 3);
    expect(a.contributions[0].powerDensityWm2).toBeCloseTo(100 / (2 * Math.PI * 9.999 * 2), 9);
    expect(b.contributions[0].powerDensityWm2).toBeCloseTo(1000 / (4 * Math.PI * 10.001 ** 2), 9);
  });
  it("auto never steps down across R*, off boresight included (the conservative choice in the transition)", () => {
    const e = {
      id: "s",
      frequencyMHz: 1900,
      powerW: 100,
      gainDbi: 15,
      position: { x: 0, y: 0, z: 0 },
      azimuthDeg: 0,
      pattern: { type: "3gpp-38.901" as const, hBeamwidthDeg: 65, vBeamwidthDeg: 8 },
      model: "auto" as const,
      apertureM: 2,
    };
    // R* = G·θ·h/720 = 31.62·65·2/720 = 5.710 m.
    const rStar = (10 ** 1.5 * 65 * 2) / 720;
    for (const deg of [0, 20, 45, 80]) {
      const c = Math.cos((deg * Math.PI) / 180);
      const s = Math.sin((deg * Math.PI) / 180);
      const pts = [rStar * (1 - 1e-6), rStar * (1 + 1e-6)].map((r) => ({ x: r * s, y: r * c, z: 0.3 }));
      const [inside, outside] = evaluate({ standard: "fcc", tier: "general", emitters: [e], points: pts }).points!;
      expect(outside.totalPercent).toBeGreaterThanOrEqual(inside.totalPercent * (1 - 1e-5));
    }
  });
});

describe("bad input names the innermost field and what was expected (common practice, no source)", () => {
  const fail = (r: unknown) => {
    const p = parseRequest(r);
    if (p.ok) throw new Error("expected a validation failure");
    return p;
  };

  it("a pattern missing a field names that field", () => {
    const r = site() as any;
    delete r.emitters[0].pattern.vBeamwidthDeg;
    const p = fail(r);
    expect(p.field).toBe("emitters[0].pattern.vBeamwidthDeg");
    expect(p.message).toMatch(/expected number, received undefined/);
  });

  it("a misspelt pattern type lists the known types", () => {
    const r = site() as any;
    r.emitters[1].pattern.type = "3gpp-38901";
    const p = fail(r);
    expect(p.field).toBe("emitters[1].pattern.type");
    expect(p.message).toMatch(/'3gpp-38\.901'/);
    expect(p.message).toMatch(/'tabulated'/);
  });

  it("a pattern that is neither the word nor an object says both", () => {
    const r = site() as any;
    r.emitters[2].pattern = "omni";
    const p = fail(r);
    expect(p.field).toBe("emitters[2].pattern");
    expect(p.message).toMatch(/expected "isotropic"; or expected object/);
  });

  it("a work area naming an emitter the request does not have is refused, not ignored", () => {
    const r = { ...site(), workArea: { polygon: [[3, 3], [9, 3], [9, 8]], adjustable: ["A", "a"] } } as any;
    const p = fail(r);
    expect(p.field).toBe("workArea.adjustable[1]");
    expect(p.message).toMatch(/"a" is not the id of any emitter/);
  });
});

describe("FCC exemption screening outside the rule's frequency table", () => {
  it("does not apply, and does not stop a request under another standard (47 CFR §1.1307(b)(3)(i)(C) covers 0.3 MHz–100 GHz, from memory)", () => {
    const r: EvaluationRequestInput = {
      standard: "icnirp-2020",
      tier: "general",
      emitters: [{ id: "MM", frequencyMHz: 200_000, powerW: 1, gainDbi: 30, position: { x: 0, y: 0, z: 5 } }],
      points: [{ x: 3, y: 0, z: 2 }],
      screening: { distanceM: 3 },
    };
    const out = evaluate(r);
    expect(out.emitters[0].exemption).toMatchObject({ applicable: false, exempt: false, thresholdErpW: null });
    expect(out.emitters[0].exemption!.reason).toMatch(/outside the §1\.1307\(b\)\(3\)\(i\)\(C\) table/);
    expect(out.points![0].totalPercent).toBeGreaterThan(0);
  });
});
