// The page's what-if state: the edits, the result drawn (the loader's while there are no edits,
// else the worker's), and the timings (edit → result; the bench script reads them).
import { useCallback, useEffect, useLayoutEffect, useRef, useState } from "react";
import type { ExposureInput, ExposureResult } from "./exposure-result";
import { keepFacadeGeometry, keepGeometry } from "./map-geometry";
import { cleanEdits, hasEdits, type EmitterEdit, type WhatIfEdits } from "./what-if";
import { unpackAreas } from "./what-if-transfer";
import type { WorkerAnswer, WorkerRequest } from "./what-if.worker";

export type WhatIfTiming = { seq: number; computeMs: number; geometryMs: number; resultMs: number };
/** For the bench script: every phase from the edit (ms after it): the worker starting on it, posting its answer, the page receiving it, React committing it, the next frame painted. */
type Phases = { startedMs: number; postedMs: number; committedMs?: number; paintedMs?: number };
declare global {
  interface Window {
    __exposureTimings?: (WhatIfTiming & Phases)[];
  }
}
const wall = () => performance.timeOrigin + performance.now();

export function useWhatIf(input: ExposureInput, base: ExposureResult | null) {
  const [edits, setEdits] = useState<WhatIfEdits>({});
  const [result, setResult] = useState<ExposureResult | null>(null);
  const [state, setState] = useState<"starting" | "ready" | "computing" | "failed">("starting");
  const [error, setError] = useState<string | null>(null);
  const [timing, setTiming] = useState<WhatIfTiming | null>(null);
  const worker = useRef<Worker | null>(null);
  const seq = useRef(0);
  const sentAt = useRef(new Map<number, number>());
  const toCommit = useRef<(WhatIfTiming & Phases) | null>(null);

  useEffect(() => {
    if (!base) return;
    const w = new Worker(new URL("./what-if.worker.ts", import.meta.url), { type: "module" });
    worker.current = w;
    w.onmessage = (event: MessageEvent<WorkerAnswer>) => {
      const answer = event.data;
      if (answer.type === "ready") return setState("ready");
      if (answer.seq !== seq.current) return; // an older edit's answer
      if (answer.type === "error") {
        setError(answer.message);
        setState("failed");
        return;
      }
      const result: ExposureResult = { ...answer.result, areas: unpackAreas(answer.result.areas) };
      keepGeometry(result.areas, answer.geometry);
      keepFacadeGeometry(result.facades, answer.facadeGeometry);
      const sent = sentAt.current.get(answer.seq) ?? wall();
      const t = { seq: answer.seq, computeMs: answer.computeMs, geometryMs: answer.geometryMs, resultMs: wall() - sent, startedMs: answer.startedAt - sent, postedMs: answer.postedAt - sent };
      toCommit.current = t;
      setResult(result);
      setTiming(t);
      setError(null);
      setState("ready");
      const list = (window.__exposureTimings ??= []);
      list.push(t);
      // Painted: the frame after React has committed the new map.
      requestAnimationFrame(() => setTimeout(() => Object.assign(t, { paintedMs: wall() - sent }), 0));
    };
    w.onerror = () => {
      setError("The what-if calculator could not start in this browser.");
      setState("failed");
    };
    w.postMessage({ type: "init", input, base } satisfies WorkerRequest);
    return () => w.terminate();
  }, [input, base]);

  const send = useCallback((next: WhatIfEdits) => {
    setEdits(next);
    const id = ++seq.current;
    if (!hasEdits(cleanEdits(input.emitters, next))) {
      setResult(null);
      setTiming(null);
      return;
    }
    sentAt.current.set(id, wall());
    setState("computing");
    worker.current?.postMessage({ type: "compute", seq: id, edits: next } satisfies WorkerRequest);
  }, [input]);

  // The same function from render to render (the emitter rows are memoised on it): the edits read from a ref.
  const current = useRef(edits);
  current.current = edits;
  const setEdit = useCallback(
    (id: string, edit: EmitterEdit | null) => {
      const next = { ...current.current };
      if (edit && Object.values(edit).some((v) => v !== undefined && v !== false)) next[id] = edit;
      else delete next[id];
      current.current = next;
      send(next);
    },
    [send],
  );

  // After React has committed a worker's answer (this hook's component commits after its children).
  useLayoutEffect(() => {
    const t = toCommit.current;
    if (!t || !result) return;
    toCommit.current = null;
    t.committedMs = wall() - (sentAt.current.get(t.seq) ?? wall());
  }, [result]);

  const reset = useCallback(() => send({}), [send]);
  const active = hasEdits(cleanEdits(input.emitters, edits));
  return { edits, setEdit, reset, active, result: active && result ? result : base, pending: active && (!result || state === "computing"), state, error, timing };
}
