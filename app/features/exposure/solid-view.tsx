// The 3D view's page body: the grid and marching cubes in a worker, three.js imported only here
// (a lazy chunk), the scene mounted when both are ready, with its key and the layer toggles.
import { useEffect, useRef, useState } from "react";
import type { EmitterInput } from "~/engine";
import type { PlanSurface } from "~/features/layout/site-plan";
import { tierLabels, type ExposureOptions } from "./options";
import type { ObstructionLike } from "./section-geometry";
import type { SolidMeshes } from "./solid-mesh";
import { solidColours } from "./solid-style";

type Props = { emitters: EmitterInput[]; surfaces: PlanSurface[]; obstructions: ObstructionLike[]; options: ExposureOptions };
/** Grid sizes the reader can choose: more nodes, a finer step, a longer computation. */
const detailNodes = { normal: 250_000, fine: 1_000_000 } as const;

type Scene = { redraw: (show: { general: boolean; occupational: boolean }) => void; dispose: () => void };

export function SolidView({ emitters, surfaces, obstructions, options }: Props) {
  const host = useRef<HTMLDivElement>(null);
  const scene = useRef<Scene | null>(null);
  const [state, setState] = useState<{ kind: "working" } | { kind: "ready"; meshes: Omit<SolidMeshes, "general" | "occupational">; firstFrameMs: number } | { kind: "failed"; message: string }>({ kind: "working" });
  const [show, setShow] = useState({ general: true, occupational: true });
  const [detail, setDetail] = useState<keyof typeof detailNodes>("normal");

  useEffect(() => {
    if (!emitters.length) return;
    setState({ kind: "working" });
    const started = performance.now();
    let cancelled = false;
    const worker = new Worker(new URL("./solid.worker.ts", import.meta.url), { type: "module" });
    const meshes = new Promise<SolidMeshes>((resolve, reject) => {
      worker.onmessage = (event: MessageEvent<{ ok: true; result: SolidMeshes } | { ok: false; message: string }>) => (event.data.ok ? resolve(event.data.result) : reject(new Error(event.data.message)));
      worker.onerror = (event) => reject(new Error(event.message || "The 3D computation stopped."));
    });
    const floorM = Math.min(0, ...surfaces.filter((s) => s.kind === "area").map((s) => s.elevationM ?? 0));
    worker.postMessage({ emitters, standard: options.standard, floorM, maxNodes: detailNodes[detail] });
    Promise.all([meshes, import("./solid-scene")])
      .then(([m, { mountSolidScene }]) => {
        if (cancelled || !host.current) return;
        const { general, occupational, ...rest } = m;
        const levels = surfaces.flatMap((s) => (s.kind === "area" && s.polygon && s.polygon.length >= 3 ? [{ polygon: s.polygon, elevationM: s.elevationM ?? 0 }] : []));
        scene.current = mountSolidScene(host.current, { general, occupational, levels, obstructions, emitters, show }, () => {
          const firstFrameMs = performance.now() - started;
          performance.mark("solid-first-frame", { detail: { firstFrameMs, computeMs: m.computeMs } });
          setState({ kind: "ready", meshes: rest, firstFrameMs });
        });
      })
      .catch((error: unknown) => {
        if (!cancelled) setState({ kind: "failed", message: error instanceof Error ? error.message : String(error) });
      })
      .finally(() => worker.terminate());
    return () => {
      cancelled = true;
      worker.terminate();
      scene.current?.dispose();
      scene.current = null;
    };
    // The scene is built once per page load (`show` is read then); the toggles redraw it.
  }, [emitters, surfaces, obstructions, options.standard, detail]);

  useEffect(() => scene.current?.redraw(show), [show]);

  const colours = solidColours();
  const label = (tier: "general" | "occupational") => tierLabels[options.standard][tier].split(" / ")[0];
  if (!emitters.length) return <p className="rounded-sheet border border-rule bg-sheet p-5 text-sm text-graphite-600">No emitter is on air at this site, so there is no boundary to show.</p>;
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_18rem]">
      <div className="min-w-0 space-y-2">
        <div className="relative aspect-[5/3] w-full overflow-hidden rounded-sheet border border-rule bg-sheet">
          {/* three.js owns this element's children; React renders none into it. */}
          <div ref={host} className="absolute inset-0" />
          {state.kind === "working" ? <p className="absolute inset-0 bg-sheet/80 p-5 text-sm text-graphite-600" role="status">Computing the boundaries in your browser…</p> : null}
        </div>
        {state.kind === "failed" ? <p className="text-sm text-danger-700">The 3D view could not be drawn: {state.message}</p> : null}
        {state.kind === "ready" ? (
          <p className="text-sm text-graphite-600" data-testid="solid-summary">
            Drag to rotate, scroll to zoom, right-drag to pan. Grid of {state.meshes.grid.nx} × {state.meshes.grid.ny} × {state.meshes.grid.nz} points, <span className="figures">{state.meshes.grid.step} m</span> apart; first frame after{" "}
            <span className="figures">{state.firstFrameMs.toFixed(0)} ms</span> (computing <span className="figures">{state.meshes.computeMs.toFixed(0)} ms</span>).
          </p>
        ) : null}
      </div>
      <div className="space-y-4 text-sm">
        <fieldset className="space-y-2">
          <legend className="font-medium text-ink-900">Compliance boundaries (100 % of the limit)</legend>
          {(["general", "occupational"] as const).map((tier) => (
            <label key={tier} className="flex items-center gap-2">
              <input type="checkbox" checked={show[tier]} onChange={(e) => setShow((s) => ({ ...s, [tier]: e.target.checked }))} />
              <svg width="18" height="14" aria-hidden="true">
                <rect width="18" height="14" rx="2" fill={colours[tier]} fillOpacity={tier === "general" ? 0.5 : 1} className="stroke-ink-900" strokeWidth={0.75} />
              </svg>
              {label(tier)}
            </label>
          ))}
        </fieldset>
        <div>
          <label htmlFor="solid-detail" className="block font-medium text-ink-900">
            Grid
          </label>
          <select id="solid-detail" value={detail} onChange={(e) => setDetail(e.target.value as keyof typeof detailNodes)} className="mt-1 w-full rounded-control border border-rule-strong bg-sheet px-2 py-1.5">
            <option value="normal">normal (up to 250 000 points)</option>
            <option value="fine">fine (up to 1 000 000 points, slower)</option>
          </select>
        </div>
        <dl className="space-y-1 text-graphite-600">
          <div>
            <dt className="inline font-medium text-ink-900">Light grey slabs:</dt> <dd className="inline">walkable levels</dd>
          </div>
          <div>
            <dt className="inline font-medium text-ink-900">Grey blocks:</dt> <dd className="inline">obstructions</dd>
          </div>
          <div>
            <dt className="inline font-medium text-ink-900">Dark boxes:</dt> <dd className="inline">antennas, facing their azimuth and tilted down</dd>
          </div>
        </dl>
        <p className="text-xs text-graphite-600">The view opens looking north-east from the south-west corner. Inside a solid, the total exceeds that tier's limit; the general-population solid holds the occupational one.</p>
      </div>
    </div>
  );
}
