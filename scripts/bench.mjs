#!/usr/bin/env node
// npm run bench — evaluations per second and wall time of the engine, and the
// command line against the NumPy peer (../shared/bench/peer_grid.py) on the
// 30-emitter rooftop request. A benchmark, not a test: it asserts nothing.
import { execFileSync, spawnSync } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { ensureBuilt, LIB_BUNDLE, ROOT } from "./engine-build.mjs";

await ensureBuilt();
const engine = await import(pathToFileURL(LIB_BUNDLE).href);

const BENCH = join(ROOT, "..", "shared", "bench");
const ROOFTOP = join(BENCH, "rooftop-30.json");
const PEER = join(BENCH, "peer_grid.py");
const RUNS = Number(process.env.BENCH_RUNS ?? 5);

const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const fmt = (ms) => `${ms.toFixed(0)} ms`;

function syntheticRooftop() {
  const emitters = [];
  for (let i = 0; i < 30; i++) {
    emitters.push({
      id: `E${i + 1}`,
      frequencyMHz: [700, 850, 1900, 2100, 3500][i % 5],
      powerW: 80 + (i % 7) * 10,
      lossDb: 1.5,
      gainDbi: 13 + (i % 4),
      position: { x: (i * 13.7) % 60, y: (i * 7.9) % 40, z: 2.5 + (i % 4) * 0.3 },
      azimuthDeg: (i * 120) % 360,
      tiltDeg: 0,
      pattern: { type: "3gpp-38.901", hBeamwidthDeg: 65, vBeamwidthDeg: 8, maxAttenuationDb: 30, sideLobeDb: 30 },
    });
  }
  return {
    standard: "fcc",
    tier: "general",
    emitters,
    grid: { x0: 0, y0: 0, x1: 60, y1: 40, step: 0.25, z0: 0, z1: 2, zCount: 11, mode: "average" },
  };
}

const haveRooftop = existsSync(ROOFTOP);
const base = haveRooftop ? JSON.parse(readFileSync(ROOFTOP, "utf8")) : syntheticRooftop();
if (!haveRooftop) console.log(`(${ROOFTOP} not found: using a synthetic 30-emitter rooftop)`);

function inProcess(name, request) {
  const parsed = engine.parseRequest(request);
  if (!parsed.ok) throw new Error(parsed.message);
  const req = parsed.request;
  const { prepared } = engine.prepareRequest(req);
  const axes = engine.gridAxes(req.grid);
  const evals = axes.nx * axes.ny * axes.nz * prepared.length;
  const times = [];
  for (let r = 0; r < RUNS; r++) {
    const t = performance.now();
    engine.computeGrid(prepared, axes, req.grid.mode === "max", null);
    times.push(performance.now() - t);
  }
  const m = median(times);
  console.log(
    `${name.padEnd(34)} ${(evals / 1e6).toFixed(2).padStart(6)} M evaluations  median ${fmt(m).padStart(7)}  best ${fmt(Math.min(...times)).padStart(7)}  ${(evals / (m / 1000) / 1e6).toFixed(1)} M eval/s (1 thread)`,
  );
}

console.log(`Engine kernel, in-process, ${RUNS} runs each:`);
inProcess("isotropic, spherical", { ...base, emitters: base.emitters.map((e) => ({ ...e, pattern: "isotropic" })) });
inProcess("3GPP pattern + 6° downtilt", { ...base, emitters: base.emitters.map((e) => ({ ...e, tiltDeg: 6 })) });
inProcess("rooftop-30 as given (3GPP, tilt 0)", base);

function wall(cmd, args) {
  const t = performance.now();
  const r = spawnSync(cmd, args, { cwd: ROOT, encoding: "utf8", maxBuffer: 64 * 1024 * 1024 });
  const ms = performance.now() - t;
  if (r.status !== 0) throw new Error(`${cmd} ${args.join(" ")} failed: ${r.stderr}`);
  return { ms, out: r.stdout };
}

if (!haveRooftop) {
  console.log("Skipping the command-line comparison with the peer: ../shared/bench is not beside the repository.");
  process.exit(0);
}

let havePeer = false;
try {
  execFileSync("python3", ["-c", "import numpy"], { stdio: "ignore" });
  havePeer = existsSync(PEER);
} catch {
  havePeer = false;
}
if (!havePeer) console.log("\nThe peer is skipped: python3 with numpy (or peer_grid.py) is not available.");

// Rounds interleave the three commands so that they share the machine's conditions;
// the ratio is taken per round, then the median over the rounds.
console.log(`\nWhole process on ${ROOFTOP} (${RUNS} interleaved rounds, median):`);
const ours = [];
const oursNpm = [];
const peer = [];
const ratios = [];
let oursOut = "";
let peerOut = "";
for (let r = 0; r < RUNS; r++) {
  const a = wall(process.execPath, [join(ROOT, "scripts", "evaluate.mjs"), ROOFTOP]);
  ours.push(a.ms);
  oursOut = a.out;
  const n = wall("npm", ["run", "-s", "evaluate", "--", ROOFTOP]);
  oursNpm.push(n.ms);
  if (havePeer) {
    const p = wall("python3", [PEER, ROOFTOP]);
    peer.push(p.ms);
    peerOut = p.out;
    ratios.push(n.ms / p.ms);
  }
}
console.log(`node scripts/evaluate.mjs              ${fmt(median(ours))}  (min ${fmt(Math.min(...ours))})`);
console.log(`npm run -s evaluate                    ${fmt(median(oursNpm))}  (min ${fmt(Math.min(...oursNpm))})`);
if (!havePeer) process.exit(0);
console.log(`python3 peer_grid.py                   ${fmt(median(peer))}  (min ${fmt(Math.min(...peer))})`);
console.log(`ratio npm run / peer, per round        median ${median(ratios).toFixed(2)}, worst ${Math.max(...ratios).toFixed(2)}  (goal ≤ 0.50)`);
console.log(`ratio node / peer (medians)            ${(median(ours) / median(peer)).toFixed(2)}`);

const a = JSON.parse(oursOut).grid;
const b = JSON.parse(peerOut).grid;
let maxRel = 0;
let cells = 0;
if (a.nx !== b.nx || a.ny !== b.ny) console.log(`GRID SHAPE DIFFERS: ours ${a.nx}×${a.ny}, peer ${b.nx}×${b.ny}`);
for (let c = 0; c < b.percent.length; c++) {
  if (b.percent[c] <= 0.1 && a.percent[c] <= 0.1) continue;
  cells++;
  const ref = Math.max(b.percent[c], 1e-12);
  maxRel = Math.max(maxRel, Math.abs(a.percent[c] - b.percent[c]) / ref);
}
console.log(`agreement over ${cells} cells above 0.1 %: max relative difference ${maxRel.toExponential(2)}`);
console.log(
  `maxPercent ours ${a.maxPercent.toFixed(6)}  peer ${b.maxPercent.toFixed(6)}  relative difference ${(Math.abs(a.maxPercent - b.maxPercent) / b.maxPercent).toExponential(2)}`,
);
