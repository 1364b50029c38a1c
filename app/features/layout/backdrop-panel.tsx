// The roof drawing under the plan: upload (POST /api/v1/sites/:id/backdrop), place it by clicking
// two points on the image and giving the distance between them, move and turn it, set its
// opacity, remove it. The placement is saved with the layout.
import { useRef, useState, type MouseEvent } from "react";
import { Button } from "~/components/button";
import type { BackdropJson } from "./json";
import { BACKDROP_MAX_BYTES } from "./limits";

type Props = {
  siteId: string;
  backdrop: BackdropJson | null;
  onChange: (backdrop: BackdropJson | null, version?: number) => void;
};

const input = "block w-full min-w-0 rounded-control border border-rule-strong bg-sheet px-2 py-1.5 text-sm tabular-nums";

async function answerMessage(response: Response) {
  const body = (await response.json().catch(() => null)) as { error?: { message?: string } } | null;
  return body?.error?.message ?? `The server answered ${response.status}.`;
}

export function BackdropPanel({ siteId, backdrop, onChange }: Props) {
  const file = useRef<HTMLInputElement>(null);
  const svg = useRef<SVGSVGElement>(null);
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [next, setNext] = useState<1 | 2>(1);

  async function upload() {
    const chosen = file.current?.files?.[0];
    if (!chosen) return setMessage({ ok: false, text: "Choose a PNG, JPEG or WebP image first." });
    if (chosen.size > BACKDROP_MAX_BYTES) return setMessage({ ok: false, text: `The drawing is larger than ${BACKDROP_MAX_BYTES / 1024 / 1024} MB. Upload a smaller copy.` });
    const body = new FormData();
    body.append("image", chosen);
    setBusy(true);
    try {
      const response = await fetch(`/api/v1/sites/${siteId}/backdrop`, { method: "POST", body, headers: { accept: "application/json" } });
      if (!response.ok) return setMessage({ ok: false, text: await answerMessage(response) });
      const answer = (await response.json()) as { backdrop: BackdropJson; version: number };
      onChange(answer.backdrop, answer.version);
      setNext(1);
      setMessage({ ok: true, text: "Uploaded. Now click two points on the drawing whose distance you know." });
    } catch {
      setMessage({ ok: false, text: "The connection failed. Try again." });
    } finally {
      setBusy(false);
    }
  }

  async function remove() {
    setBusy(true);
    try {
      const response = await fetch(`/api/v1/sites/${siteId}/backdrop`, { method: "DELETE", headers: { accept: "application/json" } });
      if (!response.ok) return setMessage({ ok: false, text: await answerMessage(response) });
      const answer = (await response.json()) as { version: number };
      onChange(null, answer.version);
      setMessage({ ok: true, text: "The drawing is removed." });
    } finally {
      setBusy(false);
    }
  }

  function pick(event: MouseEvent<SVGSVGElement>) {
    const matrix = svg.current?.getScreenCTM();
    if (!backdrop || !matrix) return;
    const p = new DOMPoint(event.clientX, event.clientY).matrixTransform(matrix.inverse());
    const at: [number, number] = [Math.round(Math.min(Math.max(p.x, 0), backdrop.widthPx)), Math.round(Math.min(Math.max(p.y, 0), backdrop.heightPx))];
    onChange(next === 1 ? { ...backdrop, p1: at } : { ...backdrop, p2: at });
    setNext(next === 1 ? 2 : 1);
  }

  const set = (field: "distanceM" | "originX" | "originY" | "rotationDeg" | "opacity", value: string) => {
    const n = Number(value.replace(",", "."));
    if (backdrop && value.trim() !== "" && Number.isFinite(n)) onChange({ ...backdrop, [field]: n });
  };

  return (
    <div className="space-y-3">
      {backdrop ? (
        <>
          <p className="text-sm text-graphite-600">
            Click the drawing to set point {next} (<span className="font-medium text-ink-900">1</span> then <span className="font-medium text-ink-900">2</span>), enter the distance between them, then where point 1 lies on the site.
          </p>
          <svg ref={svg} viewBox={`0 0 ${backdrop.widthPx} ${backdrop.heightPx}`} className="block max-h-72 w-full cursor-crosshair rounded-control border border-rule bg-paper" onClick={pick} role="img" aria-label="The roof drawing: click to set the two scale points">
            <image href={backdrop.href} width={backdrop.widthPx} height={backdrop.heightPx} />
            <line x1={backdrop.p1[0]} y1={backdrop.p1[1]} x2={backdrop.p2[0]} y2={backdrop.p2[1]} className="stroke-ink-900" strokeDasharray="6 4" strokeWidth={Math.max(backdrop.widthPx, backdrop.heightPx) / 200} vectorEffect="non-scaling-stroke" />
            {[backdrop.p1, backdrop.p2].map((p, i) => (
              <g key={i} transform={`translate(${p[0]} ${p[1]})`}>
                <circle r={Math.max(backdrop.widthPx, backdrop.heightPx) / 80} className="fill-sheet stroke-ink-900" strokeWidth={2} vectorEffect="non-scaling-stroke" />
                <text y={-Math.max(backdrop.widthPx, backdrop.heightPx) / 50} textAnchor="middle" fontSize={Math.max(backdrop.widthPx, backdrop.heightPx) / 25} className="fill-ink-900 font-bold">
                  {i + 1}
                </text>
              </g>
            ))}
          </svg>
          <div className="grid grid-cols-2 gap-2 sm:grid-cols-3">
            {(
              [
                ["distanceM", "Distance 1–2 (m)"],
                ["originX", "Point 1 at x (m)"],
                ["originY", "Point 1 at y (m)"],
                ["rotationDeg", "Turn (° clockwise)"],
              ] as const
            ).map(([field, label]) => (
              <div key={field}>
                <label htmlFor={`backdrop-${field}`} className="mb-1 block text-xs font-medium text-graphite-600">
                  {label}
                </label>
                <input id={`backdrop-${field}`} key={`${field}-${backdrop.fileId}`} inputMode="decimal" className={input} defaultValue={String(backdrop[field])} onChange={(e) => set(field, e.target.value)} />
              </div>
            ))}
            <div>
              <label htmlFor="backdrop-opacity" className="mb-1 block text-xs font-medium text-graphite-600">
                Opacity {Math.round(backdrop.opacity * 100)} %
              </label>
              <input id="backdrop-opacity" type="range" min={0.1} max={1} step={0.05} value={backdrop.opacity} onChange={(e) => set("opacity", e.target.value)} className="w-full accent-ink-900" />
            </div>
          </div>
          <div className="flex flex-wrap gap-2">
            <Button type="button" tone="danger" size="sm" disabled={busy} onClick={remove}>
              Remove drawing
            </Button>
          </div>
        </>
      ) : (
        <p className="text-sm text-graphite-600">Upload a roof drawing or an aerial image to trace over. PNG, JPEG or WebP, up to 10 MB.</p>
      )}
      <div className="flex flex-wrap items-end gap-2">
        <div className="min-w-0 flex-1 basis-60">
          <label htmlFor="backdrop-file" className="mb-1 block text-xs font-medium text-graphite-600">
            {backdrop ? "Replace with another image" : "Image"}
          </label>
          <input ref={file} id="backdrop-file" type="file" accept="image/png,image/jpeg,image/webp" className="block w-full text-sm text-ink-700 file:mr-3 file:rounded-control file:border-0 file:bg-sheet file:px-3 file:py-1.5 file:text-sm file:font-medium file:ring-1 file:ring-rule-strong" />
        </div>
        <Button type="button" tone="secondary" size="sm" disabled={busy} onClick={upload}>
          {busy ? "Working…" : "Upload"}
        </Button>
      </div>
      {message ? (
        <p role="status" className={`text-sm ${message.ok ? "text-ok-700" : "text-danger-700"}`}>
          {message.text}
        </p>
      ) : null}
    </div>
  );
}
