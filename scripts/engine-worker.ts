/**
 * Worker thread for the command line: computes grid rows of a validated
 * request with the same engine code (app/engine), pulling row chunks from a
 * shared counter and writing straight into the shared result array.
 */
import { parentPort } from "node:worker_threads";
import { gridAxes } from "../app/engine/axes";
import { prepareEmitter } from "../app/engine/prepare";
import { computeGridRows } from "../app/engine/rows";
import type { EvaluationRequest } from "../app/engine/schema";

export interface GridJob {
  request: EvaluationRequest;
  out: SharedArrayBuffer;
  counter: SharedArrayBuffer;
  mask: Uint8Array | null;
  chunk: number;
}

parentPort?.on("message", (job: GridJob) => {
  const req = job.request;
  const grid = req.grid!;
  const prepared = req.emitters.map((e, i) => prepareEmitter(e, req.standard, req.tier, i).prepared);
  const axes = gridAxes(grid);
  const out = new Float64Array(job.out);
  const counter = new Int32Array(job.counter);
  const max = grid.mode === "max";
  for (;;) {
    const j0 = Atomics.add(counter, 0, job.chunk);
    if (j0 >= axes.ny) break;
    computeGridRows(prepared, axes, max, j0, Math.min(axes.ny, j0 + job.chunk), out, job.mask);
  }
  parentPort!.postMessage("done");
});
