// The what-if Web Worker: holds one what-if model (the page's inventory and options) and answers
// each edit with the recomputed result and its maps' and facade strips' geometry (image, contours, class outlines). Edits that arrive while it is busy are coalesced: only
// the newest is computed.
import type { ExposureInput, ExposureResult } from "./exposure-result";
import type { WhatIfEdits } from "./what-if";
import { facadeGeometry, surfaceGeometry, type FacadeGeometry, type SurfaceGeometry } from "./map-geometry";
import { createWhatIfModel, type WhatIfModel } from "./what-if-model";
import { packAreas, type PackedArea } from "./what-if-transfer";

export type WorkerRequest = { type: "init"; input: ExposureInput; base: ExposureResult | null } | { type: "compute"; seq: number; edits: WhatIfEdits };
export type WorkerAnswer = { type: "ready"; primeMs: number } | { type: "result"; seq: number; result: Omit<ExposureResult, "areas"> & { areas: PackedArea[] }; geometry: SurfaceGeometry[]; facadeGeometry: FacadeGeometry[]; computeMs: number; geometryMs: number; startedAt: number; postedAt: number } | { type: "error"; seq: number; message: string };

let model: (WhatIfModel & { prime: () => void }) | null = null;
let pending: { seq: number; edits: WhatIfEdits } | null = null;
let scheduled = false;

const post = (answer: WorkerAnswer, transfer: Transferable[] = []) => (self as unknown as Worker).postMessage(answer, transfer);

/** An edit's answer: the result (its grids as transferred typed arrays: what-if-transfer.ts) and the drawings of its surfaces. */
function answer(edits: WhatIfEdits) {
  const started = performance.now();
  const result = model!.compute(edits);
  const computed = performance.now();
  // The map's image and contours too, here rather than on the page's thread (map-geometry.ts).
  const geometry = result.areas.map(surfaceGeometry);
  const facades = result.facades.map(facadeGeometry);
  const packed = packAreas(result.areas);
  return { result: { ...result, areas: packed.areas }, geometry, facades, transfer: packed.transfer, started, computed };
}

/**
 * Runs a few off and power edits through the compute and the drawings once the layers are ready,
 * before saying "ready": the engine's kernels are warm from the priming, but the re-weighting,
 * the contours and the image encoder would otherwise run as cold code for the user's first edits
 * (measured: the first edits took two to three times as long as the later ones). Bounded in time.
 */
function warmUp(ids: string[]) {
  const until = performance.now() + 1500;
  for (let k = 0; k < 12 && ids.length && performance.now() < until; k++) {
    const id = ids[k % ids.length];
    answer(k % 3 === 0 ? { [id]: { off: true } } : { [id]: { powerDb: -1 - (k % 4) } });
  }
}

function run() {
  scheduled = false;
  const job = pending;
  pending = null;
  if (!job || !model) return;
  try {
    const { result, geometry, facades, transfer, started, computed } = answer(job.edits);
    const done = performance.now();
    // startedAt / postedAt on the wall clock (the page's performance.now() has another origin): the bench splits the wait.
    post({ type: "result", seq: job.seq, result, geometry, facadeGeometry: facades, computeMs: computed - started, geometryMs: done - computed, startedAt: performance.timeOrigin + started, postedAt: performance.timeOrigin + done }, transfer);
  } catch (error) {
    post({ type: "error", seq: job.seq, message: error instanceof Error ? error.message : String(error) });
  }
}

self.onmessage = (event: MessageEvent<WorkerRequest>) => {
  const message = event.data;
  if (message.type === "init") {
    const started = performance.now();
    model = createWhatIfModel(message.input, message.base ?? undefined);
    model.prime();
    try {
      if (model.linear) warmUp(message.input.emitters.filter((e) => e.active).map((e) => e.id));
    } catch {
      // Nothing to warm: an edit that fails says why when the user makes it.
    }
    post({ type: "ready", primeMs: performance.now() - started });
  } else {
    pending = { seq: message.seq, edits: message.edits };
    if (!scheduled) {
      scheduled = true;
      setTimeout(run, 0);
    }
  }
};
