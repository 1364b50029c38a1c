/**
 * Command line: read one JSON request (file path or "-" for stdin), print one
 * JSON response on stdout. Bad input: a message naming the field on stderr,
 * exit status 2. Grid rows are spread over worker threads running the same
 * engine code. Bundled by scripts/engine-build.mjs; run via scripts/evaluate.mjs.
 */
import { readFileSync } from "node:fs";
import { resolve } from "node:path";
import { availableParallelism } from "node:os";
import { Worker } from "node:worker_threads";
import { EngineInputError } from "../app/engine/errors";
import { evaluateParsed, parseRequest, prepareRequest, requestGrid } from "../app/engine/evaluate";
import { computeGridRows } from "../app/engine/rows";
import type { GridJob } from "./engine-worker";

/** Below this many emitter-sample evaluations a second thread does not pay for its start-up. */
const PARALLEL_MIN_EVALUATIONS = 300_000;

const PROFILE = process.env.ISOTROPE_PROFILE === "1";
const T0 = performance.now();
const mark = (what: string) => {
  if (PROFILE) process.stderr.write(`[engine] ${what} ${(performance.now() - T0).toFixed(1)} ms (process ${(performance.now()).toFixed(1)} ms)\n`);
};

function fail(message: string, code = 2): never {
  process.stderr.write(`evaluate: ${message}\n`);
  process.exit(code);
}

function threadCount(): number {
  const env = Number(process.env.ISOTROPE_ENGINE_THREADS);
  if (Number.isInteger(env) && env >= 1) return Math.min(env, 16);
  return Math.max(1, Math.min(availableParallelism(), 8));
}

// A closed pipe (e.g. `| head`) is not an error of ours.
process.stdout.on("error", (e: NodeJS.ErrnoException) => {
  if (e.code === "EPIPE") process.exit(0);
  throw e;
});

async function main(): Promise<void> {
  const src = process.argv[2];
  if (!src) fail("usage: npm run -s evaluate -- FILE   (FILE a path, or - for stdin)");
  const threads = threadCount();
  // Start the helper threads first: their start-up overlaps reading and validating the request.
  const workers: Worker[] = [];
  for (let t = 1; t < threads; t++) workers.push(new Worker(new URL("./engine-worker.mjs", import.meta.url)));
  const stop = () => workers.forEach((w) => void w.terminate());
  let text: string;
  try {
    // npm runs scripts in the package's folder; a relative path means the folder npm was called from (INIT_CWD),
    // so `npm run -s evaluate -- runs/1/request.json` works inside an unzipped filing bundle.
    text = readFileSync(src === "-" ? 0 : resolve(process.env.INIT_CWD ?? process.cwd(), src), "utf8");
  } catch (e) {
    stop();
    fail(`input: cannot read ${src === "-" ? "stdin" : src}: ${(e as Error).message}`);
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    stop();
    fail(`input: not valid JSON: ${(e as Error).message}`);
  }
  mark("read+JSON.parse");
  const parsed = parseRequest(json);
  mark("validated");
  if (!parsed.ok) {
    stop();
    fail(`invalid request: ${parsed.message}`);
  }
  const req = parsed.request;
  try {
    const main = prepareRequest(req); // throws EngineInputError, e.g. a frequency outside the standard's table
    const g = requestGrid(req);
    let percent: Float64Array | undefined;
    if (g && req.grid) {
      const { axes, mask } = g;
      const evaluations = axes.nx * axes.ny * axes.nz * req.emitters.length;
      const helpers = evaluations >= PARALLEL_MIN_EVALUATIONS ? workers : [];
      if (helpers.length < workers.length) stop();
      const out = new SharedArrayBuffer(8 * axes.nx * axes.ny);
      const counter = new SharedArrayBuffer(4);
      const chunk = Math.max(1, Math.min(8, Math.ceil(axes.ny / (16 * threads))));
      const done = helpers.map(
        (w) =>
          new Promise<void>((resolve, reject) => {
            w.once("message", () => resolve());
            w.once("error", reject);
            const job: GridJob = { request: req, out, counter, mask, chunk };
            w.postMessage(job);
          }),
      );
      percent = new Float64Array(out);
      const cnt = new Int32Array(counter);
      const max = req.grid.mode === "max";
      for (;;) {
        const j0 = Atomics.add(cnt, 0, chunk);
        if (j0 >= axes.ny) break;
        computeGridRows(main.prepared, axes, max, j0, Math.min(axes.ny, j0 + chunk), percent, mask);
      }
      mark("main thread rows done");
      await Promise.all(done);
      mark("workers done");
      stop();
    } else stop();
    const response = evaluateParsed(req, percent);
    mark("response assembled");
    process.stdout.write(JSON.stringify(response) + "\n");
    mark("written");
  } catch (e) {
    stop();
    if (e instanceof EngineInputError) fail(`invalid request: ${e.message}`);
    fail(`internal error: ${(e as Error).stack ?? e}`, 1);
  }
}

void main();
