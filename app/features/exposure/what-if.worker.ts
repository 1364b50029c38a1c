// The what-if Web Worker: holds one what-if model (the page's inventory and options) and answers
// each edit with the recomputed result and its maps' and facade strips' geometry (image, contours, class outlines). Edits that arrive while it is busy are coalesced: only
// the newest is computed.
import type { ExposureInput, ExposureResult } from "./exposure-result";
import type { WhatIfEdits } from "./what-if";
import { facadeGeometry, surfaceGeometry, type FacadeGeometry, type SurfaceGeometry } from "./map-geometry";
import { createWhatIfModel, type WhatIfModel } from "./what-if-model";

export type WorkerRequest = { type: "init"; input: ExposureInput; base: ExposureResult | null } | { type: "compute"; seq: number; edits: WhatIfEdits };
export type WorkerAnswer = { type: "ready"; primeMs: number } | { type: "result"; seq: number; result: ExposureResult; geometry: SurfaceGeometry[]; facadeGeometry: FacadeGeometry[]; computeMs: number; geometryMs: number; startedAt: number; postedAt: number } | { type: "error"; seq: number; message: string };

let model: (WhatIfModel & { prime: () => void }) | null = null;
let pending: { seq: number; edits: WhatIfEdits } | null = null;
let scheduled = false;

const post = (answer: WorkerAnswer) => (self as unknown as Worker).postMessage(answer);

function run() {
  scheduled = false;
  const job = pending;
  pending = null;
  if (!job || !model) return;
  const started = performance.now();
  try {
    const result = model.compute(job.edits);
    const computed = performance.now();
    // The map's image and contours too, here rather than on the page's thread (map-geometry.ts).
    const geometry = result.areas.map(surfaceGeometry);
    const facades = result.facades.map(facadeGeometry);
    const done = performance.now();
    // startedAt / postedAt on the wall clock (the page's performance.now() has another origin): the bench splits the wait.
    post({ type: "result", seq: job.seq, result, geometry, facadeGeometry: facades, computeMs: computed - started, geometryMs: done - computed, startedAt: performance.timeOrigin + started, postedAt: performance.timeOrigin + done });
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
    post({ type: "ready", primeMs: performance.now() - started });
  } else {
    pending = { seq: message.seq, edits: message.edits };
    if (!scheduled) {
      scheduled = true;
      setTimeout(run, 0);
    }
  }
};
