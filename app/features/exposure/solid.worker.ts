// The 3D view's worker: the grid and the marching cubes off the main thread, so the page stays
// responsive while they run (a few hundred ms on the demo rooftop). Positions go back as
// transferred buffers.
import type { EmitterInput, StandardId } from "~/engine";
import { solidMeshes } from "./solid-mesh";

type Job = { emitters: EmitterInput[]; standard: StandardId; floorM: number; maxNodes: number };

self.onmessage = (event: MessageEvent<Job>) => {
  try {
    const { emitters, standard, floorM, maxNodes } = event.data;
    const result = solidMeshes(emitters, standard, floorM, { maxNodes });
    (self as unknown as Worker).postMessage({ ok: true, result }, [result.general.buffer, result.occupational.buffer]);
  } catch (error) {
    (self as unknown as Worker).postMessage({ ok: false, message: error instanceof Error ? error.message : String(error) });
  }
};
