/** The command line end to end: spawn `node scripts/evaluate.mjs`, JSON in, JSON out. */
import { spawnSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { evaluate, parseRequest } from "../../app/engine/evaluate";
import type { EvaluationRequestInput } from "../../app/engine/schema";

const ROOT = join(__dirname, "..", "..");
const dir = mkdtempSync(join(tmpdir(), "isotrope-cli-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function run(args: string[], input?: string, env: Record<string, string> = {}) {
  const r = spawnSync(process.execPath, [join(ROOT, "scripts", "evaluate.mjs"), ...args], {
    input,
    encoding: "utf8",
    env: { ...process.env, ...env },
    maxBuffer: 256 * 1024 * 1024,
  });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}
function file(name: string, body: unknown): string {
  const p = join(dir, name);
  writeFileSync(p, typeof body === "string" ? body : JSON.stringify(body));
  return p;
}

const sector = { type: "3gpp-38.901", hBeamwidthDeg: 65, vBeamwidthDeg: 8, maxAttenuationDb: 30, sideLobeDb: 30 } as const;
function rooftop(nEmitters: number, x1: number, y1: number): EvaluationRequestInput {
  return {
    standard: "fcc",
    tier: "general",
    emitters: Array.from({ length: nEmitters }, (_, i) => ({
      id: `E${i + 1}`,
      frequencyMHz: [700, 1900, 3500][i % 3],
      powerW: 60 + 10 * (i % 5),
      lossDb: 1.5,
      gainDbi: 13 + (i % 4),
      position: { x: (i * 7.3) % x1, y: (i * 3.1) % y1, z: 2.5 + (i % 3) * 0.3 },
      azimuthDeg: (i * 120) % 360,
      tiltDeg: i % 2 ? 4 : 0,
      pattern: sector,
    })),
    points: [{ x: 1, y: 2, z: 1.5 }],
    grid: { x0: 0, y0: 0, x1, y1, step: 0.25, z0: 0, z1: 2, zCount: 11, mode: "average" },
  };
}

describe("npm run evaluate -- FILE", () => {
  it("reads a request file and prints the same numbers as the engine in-process", () => {
    const req = rooftop(6, 20, 12);
    const r = run([file("site.json", req)]);
    expect(r.stderr).toBe("");
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out).toEqual(JSON.parse(JSON.stringify(evaluate(req))));
    expect(out.grid.nx).toBe(81);
    expect(out.grid.ny).toBe(49);
    expect(out.grid.percent).toHaveLength(81 * 49);
    expect(out.points[0].contributions).toHaveLength(6);
  });

  it("polygons, classification, contours and the work-area plan come out as in-process (worker threads on)", () => {
    const req = rooftop(12, 30, 20) as any;
    req.grid.polygons = [[[2, 2], [28, 3], [25, 18], [4, 15]]];
    req.grid.classify = true;
    req.grid.contours = [100, 50];
    req.workArea = { polygon: [[5, 5], [15, 5], [15, 12], [5, 12]] };
    req.screening = { distanceM: 3 };
    const r = run([file("full.json", req)], undefined, { ISOTROPE_ENGINE_THREADS: "2" });
    expect(r.stderr).toBe("");
    expect(JSON.parse(r.stdout)).toEqual(JSON.parse(JSON.stringify(evaluate(req))));
  });

  it("a hand-checked point: 1 kW EIRP at 10 m, 1900 MHz, FCC general → 7.9577 %", () => {
    const req = {
      standard: "fcc",
      tier: "general",
      emitters: [{ id: "a", frequencyMHz: 1900, powerW: 100, gainDbi: 10, position: { x: 0, y: 0, z: 0 } }],
      points: [{ x: 6, y: 8, z: 0 }],
    };
    const out = JSON.parse(run([file("one.json", req)]).stdout);
    // S = 1000/(4π·100) = 0.795775 W/m²; limit 10 W/m² → 7.95775 %.
    expect(out.points[0].totalPercent).toBeCloseTo(7.95775, 5);
    expect(out.emitters[0].eirpW).toBeCloseTo(1000, 9);
  });

  it("reads stdin with -", () => {
    const req = rooftop(2, 5, 5);
    const r = run(["-"], JSON.stringify(req));
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout).grid.maxPercent).toBeCloseTo(evaluate(req).grid!.maxPercent, 9);
  });

  it("gives the same bytes on one thread and on two (rows split across worker threads)", () => {
    const f = file("big.json", rooftop(12, 30, 20));
    const one = run([f], undefined, { ISOTROPE_ENGINE_THREADS: "1" });
    const two = run([f], undefined, { ISOTROPE_ENGINE_THREADS: "2" });
    expect(one.code).toBe(0);
    expect(two.stdout).toBe(one.stdout);
  });

  it("bad input: exit 2 and a message naming the field", () => {
    const req = rooftop(2, 5, 5) as any;
    req.emitters[1].powerW = -5;
    const r = run([file("bad.json", req)]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe("");
    expect(r.stderr).toMatch(/emitters\[1\]\.powerW: Too small: expected number to be >=0/);
  });

  it("bad input says what was expected: a missing coordinate, an unknown standard", () => {
    const missing = rooftop(1, 5, 5) as any;
    delete missing.emitters[0].position.z;
    const a = run([file("missing.json", missing)]);
    expect(a.code).toBe(2);
    expect(a.stderr).toMatch(/emitters\[0\]\.position\.z: Invalid input: expected number, received undefined/);
    const b = run([file("standard.json", { ...(rooftop(1, 5, 5) as any), standard: "fcc-1996" })]);
    expect(b.code).toBe(2);
    expect(b.stderr).toMatch(/standard: Invalid option: expected one of "fcc"/);
  });

  it("a frequency outside the standard's table: exit 2 naming emitters[i].frequencyMHz", () => {
    const req = { ...rooftop(1, 5, 5), standard: "sc6-2015" } as any;
    req.emitters[0].frequencyMHz = 5;
    const r = run([file("freq.json", req)]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/emitters\[0\]\.frequencyMHz.*outside the sc6-2015/);
  });

  it("not JSON, a missing file, no argument: exit 2 with a message", () => {
    const a = run([file("junk.json", "{ not json")]);
    expect(a.code).toBe(2);
    expect(a.stderr).toMatch(/not valid JSON/);
    const b = run([join(dir, "nope.json")]);
    expect(b.code).toBe(2);
    expect(b.stderr).toMatch(/cannot read/);
    const c = run([]);
    expect(c.code).toBe(2);
    expect(c.stderr).toMatch(/usage/);
  });

  it("size bound: a 200 m × 200 m site at 0.25 m with 11 heights and 30 emitters fits; twice the area is refused", () => {
    const fits = rooftop(30, 200, 200);
    const p = parseRequest(fits);
    expect(p.ok).toBe(true);
    const tooBig = rooftop(30, 400, 200);
    const r = run([file("huge.json", tooBig)]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/grid: request too large: 14106412 samples .* exceeds the bound of 8000000/);
    const tooMany = rooftop(60, 200, 200);
    const m = run([file("many.json", tooMany)]);
    expect(m.code).toBe(2);
    expect(m.stderr).toMatch(/emitters: request too large: .* evaluations exceeds the bound of 400000000/);
  });
});
