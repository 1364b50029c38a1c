/**
 * Property tests (fast-check) of the evaluation as a whole: common practice, no source,
 * beyond the 1/R² law of the far field (FCC OET Bulletin 65 §2, eq. (3)).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { EngineInputError } from "./errors";
import { gridAxes } from "./axes";
import { evaluate, evaluateParsed, parseRequest, prepareRequest } from "./evaluate";
import { percentAt } from "./kernel";
import { limitRangeMHz, STANDARD_IDS, TIERS } from "./limits";
import type { EvaluationRequestInput } from "./schema";

const coord = fc.double({ min: -50, max: 50, noNaN: true });
const pos = fc.record({ x: coord, y: coord, z: fc.double({ min: -5, max: 30, noNaN: true }) });

const pattern = fc.oneof(
  fc.constant("isotropic" as const),
  fc.record({
    type: fc.constant("3gpp-38.901" as const),
    hBeamwidthDeg: fc.double({ min: 5, max: 360, noNaN: true }),
    vBeamwidthDeg: fc.double({ min: 2, max: 180, noNaN: true }),
    maxAttenuationDb: fc.double({ min: 0, max: 60, noNaN: true }),
    sideLobeDb: fc.double({ min: 0, max: 60, noNaN: true }),
  }),
  fc.record({
    type: fc.constant("itu-r-f.1336-sectoral" as const),
    hBeamwidthDeg: fc.double({ min: 10, max: 180, noNaN: true }),
    vBeamwidthDeg: fc.double({ min: 2, max: 45, noNaN: true }),
    kH: fc.double({ min: 0, max: 1, noNaN: true }),
    kV: fc.double({ min: 0, max: 1, noNaN: true }),
    kP: fc.double({ min: 0, max: 1, noNaN: true }),
  }),
  fc.record({
    type: fc.constant("tabulated" as const),
    horizontal: fc.array(fc.record({ angleDeg: fc.double({ min: -360, max: 720, noNaN: true }), attenuationDb: fc.double({ min: 0, max: 40, noNaN: true }) }), { minLength: 1, maxLength: 8 }),
    vertical: fc.array(fc.record({ angleDeg: fc.double({ min: -90, max: 90, noNaN: true }), attenuationDb: fc.double({ min: 0, max: 40, noNaN: true }) }), { minLength: 1, maxLength: 8 }),
  }),
);

/** A valid emitter for FCC (0.3–100 000 MHz), any model and pattern. */
const emitter = (id: string) =>
  fc.record({
    id: fc.constant(id),
    frequencyMHz: fc.double({ min: 0.3, max: 100_000, noNaN: true }),
    powerW: fc.double({ min: 0, max: 1e5, noNaN: true }),
    lossDb: fc.double({ min: 0, max: 10, noNaN: true }),
    gainDbi: fc.double({ min: -10, max: 45, noNaN: true }),
    position: pos,
    azimuthDeg: fc.double({ min: -720, max: 720, noNaN: true }),
    tiltDeg: fc.double({ min: -90, max: 90, noNaN: true }),
    pattern,
    model: fc.constantFrom("spherical" as const, "cylindrical" as const, "auto" as const, "aperture" as const),
    apertureM: fc.double({ min: 0.1, max: 10, noNaN: true }),
    reflectionFactor: fc.double({ min: 1, max: 4, noNaN: true }),
    dutyFactor: fc.double({ min: 0, max: 1, noNaN: true }),
  });
const emitters = fc.integer({ min: 1, max: 4 }).chain((n) => fc.tuple(...Array.from({ length: n }, (_, i) => emitter(`e${i}`))));
const points = fc.array(pos, { minLength: 1, maxLength: 5 });

const req = (es: EvaluationRequestInput["emitters"], pts: { x: number; y: number; z: number }[]): EvaluationRequestInput => ({
  standard: "fcc",
  tier: "general",
  emitters: es,
  points: pts,
});
const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

describe("properties", () => {
  it("far-field S falls as 1/R² (isotropic, spherical)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 1e4, noNaN: true }), fc.double({ min: 1.01, max: 100, noNaN: true }), (r, k) => {
        const e = { id: "a", frequencyMHz: 1900, powerW: 50, gainDbi: 12, position: { x: 0, y: 0, z: 0 } };
        const [p1, p2] = evaluate(req([e], [{ x: r, y: 0, z: 0 }, { x: 0, y: -r * k, z: 0 }])).points!;
        expect(rel(p1.totalPercent / p2.totalPercent, k * k)).toBeLessThan(1e-12);
      }),
    );
  });

  it("totals do not depend on the order of the emitters", () => {
    fc.assert(
      fc.property(emitters, points, (es, pts) => {
        const a = evaluate(req(es, pts)).points!;
        const b = evaluate(req([...es].reverse(), pts)).points!;
        a.forEach((p, i) => expect(rel(b[i].totalPercent, p.totalPercent)).toBeLessThan(1e-12));
      }),
    );
  });

  it("splitting an emitter into two halves of its power leaves the totals unchanged", () => {
    fc.assert(
      fc.property(emitters, points, (es, pts) => {
        const [first, ...rest] = es;
        const halves = [
          { ...first, id: "h1", powerW: first.powerW / 2 },
          { ...first, id: "h2", powerW: first.powerW / 2 },
        ];
        const a = evaluate(req(es, pts)).points!;
        const b = evaluate(req([...halves, ...rest], pts)).points!;
        a.forEach((p, i) => expect(rel(b[i].totalPercent, p.totalPercent) < 1e-9 || Math.abs(b[i].totalPercent - p.totalPercent) < 1e-300).toBe(true));
      }),
    );
  });

  it("contributions add up to the total, and power density is percent × limit", () => {
    fc.assert(
      fc.property(emitters, points, (es, pts) => {
        const r = evaluate(req(es, pts));
        for (const p of r.points!) {
          const sum = p.contributions.reduce((s, c) => s + c.percent, 0);
          expect(Math.abs(sum - p.totalPercent)).toBeLessThanOrEqual(1e-12 * Math.max(1, p.totalPercent));
          p.contributions.forEach((c, e) =>
            expect(Math.abs(c.powerDensityWm2 - (c.percent / 100) * r.emitters[e].limitWm2)).toBeLessThanOrEqual(1e-12 * Math.max(1, c.powerDensityWm2)),
          );
        }
      }),
    );
  });

  it("no NaN or Infinity for any valid input, at points and on grids, any standard", () => {
    fc.assert(
      fc.property(emitters, points, fc.constantFrom(...STANDARD_IDS), fc.constantFrom(...TIERS), fc.constantFrom("average" as const, "max" as const), (es, pts, standard, tier, mode) => {
        const [lo, hi] = limitRangeMHz(standard, tier);
        const fitted = es.map((e) => ({ ...e, frequencyMHz: Math.min(hi, Math.max(lo, e.frequencyMHz)) }));
        const r = evaluate({
          standard,
          tier,
          emitters: fitted,
          points: pts,
          grid: { x0: -3, y0: -3, x1: 3, y1: 3, step: 1.5, z0: 0, z1: 2, zCount: 3, mode },
        });
        const all = [
          ...r.points!.flatMap((p) => [p.totalPercent, ...p.contributions.flatMap((c) => [c.percent, c.powerDensityWm2])]),
          ...r.grid!.percent,
          r.grid!.maxPercent,
          ...r.emitters.flatMap((e) => [e.eirpW, e.limitWm2, e.complianceDistanceM]),
        ];
        for (const v of all) expect(Number.isFinite(v)).toBe(true);
      }),
      { numRuns: 150 },
    );
  });

  it("the grid kernel's fast paths equal the point-by-point reference (≤ 1e-6 relative) for any emitters", () => {
    fc.assert(
      fc.property(emitters, fc.constantFrom("average" as const, "max" as const), (es, mode) => {
        const r = parseRequest({
          standard: "fcc",
          tier: "general",
          // Put some emitters on grid nodes and at grid heights to hit the degenerate geometry.
          emitters: es.map((e, i) => (i === 0 ? { ...e, position: { x: 1, y: -1, z: 1 } } : e)),
          grid: { x0: -4, y0: -4, x1: 4, y1: 4, step: 1, z0: 0, z1: 2, zCount: 3, mode },
        });
        if (!r.ok) throw new Error(r.message);
        const g = evaluateParsed(r.request).grid!;
        const p = prepareRequest(r.request).prepared;
        const a = gridAxes(r.request.grid!);
        for (let j = 0; j < a.ny; j++)
          for (let i = 0; i < a.nx; i++) {
            let agg = 0;
            for (let k = 0; k < a.nz; k++) {
              let s = 0;
              for (const pe of p) s += percentAt(pe, a.xs[i], a.ys[j], a.zs[k]);
              agg = mode === "max" ? Math.max(agg, s) : agg + s / a.nz;
            }
            expect(Math.abs(g.percent[j * a.nx + i] - agg)).toBeLessThanOrEqual(1e-6 * agg + 1e-6);
          }
      }),
      { numRuns: 150 },
    );
  });

  it("every invalid input is rejected, naming the field", () => {
    const good = (): Record<string, unknown> => ({
      standard: "fcc",
      tier: "general",
      emitters: [{ id: "a", frequencyMHz: 1900, powerW: 10, gainDbi: 10, position: { x: 0, y: 0, z: 0 } }],
      points: [{ x: 1, y: 1, z: 1 }],
    });
    type Mut = [string, (r: any) => void];
    const bad: Mut[] = [
      ["standard", (r) => (r.standard = "nope")],
      ["tier", (r) => (r.tier = "public")],
      ["emitters", (r) => (r.emitters = [])],
      ["emitters[0].id", (r) => delete r.emitters[0].id],
      ["emitters[0].powerW", (r) => (r.emitters[0].powerW = -1)],
      ["emitters[0].powerW", (r) => (r.emitters[0].powerW = NaN)],
      ["emitters[0].powerW", (r) => (r.emitters[0].powerW = "10")],
      ["emitters[0].frequencyMHz", (r) => (r.emitters[0].frequencyMHz = 0)],
      ["emitters[0].gainDbi", (r) => (r.emitters[0].gainDbi = Infinity)],
      ["emitters[0].tiltDeg", (r) => (r.emitters[0].tiltDeg = 91)],
      ["emitters[0].dutyFactor", (r) => (r.emitters[0].dutyFactor = 1.5)],
      ["emitters[0].reflectionFactor", (r) => (r.emitters[0].reflectionFactor = 0.5)],
      ["emitters[0].apertureM", (r) => (r.emitters[0].model = "cylindrical")],
      ["emitters[0].model", (r) => (r.emitters[0].model = "magic")],
      ["emitters[0].pattern.hBeamwidthDeg", (r) => (r.emitters[0].pattern = { type: "3gpp-38.901", hBeamwidthDeg: 0, vBeamwidthDeg: 10 })],
      ["emitters[0].position.z", (r) => delete r.emitters[0].position.z],
      ["emitters[0].powerw", (r) => (r.emitters[0].powerw = 3)],
      ["emitters[1].id", (r) => r.emitters.push({ ...r.emitters[0] })],
      ["grid", (r) => delete r.points],
      ["grid.step", (r) => (r.grid = { x0: 0, y0: 0, x1: 1, y1: 1, step: 0 })],
      ["grid.x1", (r) => (r.grid = { x0: 2, y0: 0, x1: 1, y1: 1, step: 0.5 })],
      ["grid.z1", (r) => (r.grid = { x0: 0, y0: 0, x1: 1, y1: 1, step: 0.5, zCount: 3 })],
      ["grid.zCount", (r) => (r.grid = { x0: 0, y0: 0, x1: 1, y1: 1, step: 0.5, zCount: 2.5, z1: 2 })],
      ["points[0].x", (r) => (r.points[0].x = null)],
    ];
    for (const [field, mutate] of bad) {
      const r = good();
      mutate(r);
      const p = parseRequest(r);
      expect(p.ok, field).toBe(false);
      if (!p.ok) expect(p.field).toBe(field);
      expect(() => evaluate(r)).toThrow(EngineInputError);
    }
    // A frequency outside the standard's table passes the schema but is refused by the engine.
    const r = good();
    (r.emitters as any)[0].frequencyMHz = 0.2;
    try {
      evaluate(r);
      expect.unreachable();
    } catch (e) {
      expect((e as EngineInputError).field).toBe("emitters[0].frequencyMHz");
    }
  });

  it("random junk is rejected, never evaluated", () => {
    fc.assert(
      fc.property(fc.anything(), (junk) => {
        expect(parseRequest(junk).ok).toBe(false);
      }),
    );
  });
});
