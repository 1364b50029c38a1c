// The elevation view's drawing: % of limit in colour over distance along the cut × height, the
// levels as slabs with the people-height band above the walkable ones, obstructions in section,
// antennas near the cut, and the 100 % boundary of each tier as labelled lines.
import { useId, useMemo, useRef, useState, type MouseEvent } from "react";
import type { Tier } from "~/engine";
import { percentLabel } from "./colour-scale";
import { fieldImage } from "./field-image";
import { BoundaryLine } from "./section-legend";
import type { LevelCrossing, SectionGrid, SolidCrossing } from "./section-geometry";

type Props = {
  grid: SectionGrid;
  values: Float64Array;
  /** What the pointer reads out: each tier's values with its name. */
  readout?: { label: string; values: Float64Array }[];
  boundaries: { tier: Tier; label: string; lines: [number, number][][] }[];
  levels: LevelCrossing[];
  obstructions: SolidCrossing[];
  antennas: { id: string; s: number; z: number }[];
  people: { fromM: number; toM: number };
  width?: number;
};

const M = { left: 56, right: 16, top: 14, bottom: 44 };

/** Vertical exaggeration so the drawing is at least `minPx` tall: 1, 1.5, 2 … at most 4. */
export function verticalExaggeration(heightM: number, pxPerM: number, minPx = 300) {
  const want = minPx / (heightM * pxPerM);
  return want <= 1 ? 1 : Math.min(4, Math.ceil(want * 2) / 2);
}

/** The cut's colour field: the maps' own image of a grid (one pixel a node, rows from the top down). */
function useFieldImage(grid: SectionGrid, values: Float64Array) {
  return useMemo(() => fieldImage({ x0: 0, y0: 0, step: 1, nx: grid.ns, ny: grid.nz }, values).href, [grid, values]);
}

export function SectionChart({ grid, values, readout = [], boundaries, levels, obstructions, antennas, people, width = 960 }: Props) {
  const clipId = useId().replace(/:/g, "");
  const svgRef = useRef<SVGSVGElement>(null);
  const [pointer, setPointer] = useState<{ i: number; k: number } | null>(null);
  const href = useFieldImage(grid, values);
  const plotW = width - M.left - M.right;
  const sx = plotW / grid.length;
  const zTop = grid.z0 + (grid.nz - 1) * grid.step;
  const ex = verticalExaggeration(zTop - grid.z0, sx);
  const sz = sx * ex;
  const plotH = (zTop - grid.z0) * sz;
  const X = (s: number) => M.left + s * sx;
  const Y = (z: number) => M.top + (zTop - z) * sz;
  const height = M.top + plotH + M.bottom;
  const sTicks = ticks(0, grid.length, grid.length > 60 ? 10 : 5);
  const zTicks = ticks(grid.z0, zTop, (zTop - grid.z0) * ex > 30 ? 5 : 2);
  const onMove = (event: MouseEvent<SVGSVGElement>) => {
    const m = svgRef.current?.getScreenCTM();
    if (!m) return;
    const p = new DOMPoint(event.clientX, event.clientY).matrixTransform(m.inverse());
    const i = Math.round((p.x - M.left) / sx / grid.step);
    const k = Math.round((zTop - (p.y - M.top) / sz - grid.z0) / grid.step);
    setPointer(i >= 0 && i < grid.ns && k >= 0 && k < grid.nz ? { i, k } : null);
  };
  const path = (ring: [number, number][]) => ring.map(([s, z], i) => `${i ? "L" : "M"}${X(s).toFixed(1)} ${Y(z).toFixed(1)}`).join("");

  return (
    <svg ref={svgRef} viewBox={`0 0 ${width} ${height}`} className="block h-auto w-full rounded-sheet border border-rule bg-white" role="img" aria-label="Elevation view along the cut" onMouseMove={onMove} onMouseLeave={() => setPointer(null)}>
      <defs>
        <clipPath id={`plot-${clipId}`}>
          <rect x={M.left} y={M.top} width={plotW} height={plotH} />
        </clipPath>
        <pattern id={`solid-${clipId}`} width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <rect width="6" height="6" className="fill-rule" />
          <line x1="0" y1="0" x2="0" y2="6" className="stroke-rule-strong" strokeWidth="1.5" />
        </pattern>
        <pattern id={`people-${clipId}`} width="8" height="8" patternUnits="userSpaceOnUse" patternTransform="rotate(-45)">
          <line x1="0" y1="0" x2="0" y2="8" className="stroke-white" strokeWidth="1.2" strokeOpacity="0.75" />
        </pattern>
      </defs>
      <g clipPath={`url(#plot-${clipId})`}>
        {href ? <image href={href} x={M.left} y={M.top} width={plotW} height={plotH} preserveAspectRatio="none" /> : <rect x={M.left} y={M.top} width={plotW} height={plotH} className="fill-paper-deep" />}
        {levels.map((l, i) =>
          l.access === "none" ? null : (
            <g key={`p${i}`}>
              <rect x={X(l.from)} y={Y(l.elevationM + people.toM)} width={(l.to - l.from) * sx} height={(people.toM - people.fromM) * sz} fill={`url(#people-${clipId})`} className="stroke-white" strokeWidth={1} strokeDasharray="3 3" />
            </g>
          ),
        )}
        {obstructions.map((o, i) => (
          <rect key={`o${i}`} x={X(o.from)} y={Y(o.topM)} width={(o.to - o.from) * sx} height={(o.topM - o.baseM) * sz} fill={`url(#solid-${clipId})`} className="stroke-graphite-600" strokeWidth={1} />
        ))}
        {levels.map((l, i) => (
          <rect key={`l${i}`} x={X(l.from)} y={Y(l.elevationM)} width={(l.to - l.from) * sx} height={Math.max(4, 0.3 * sz)} className="fill-graphite-600 stroke-ink-900" strokeWidth={1} />
        ))}
        {boundaries.map((b) => b.lines.map((ring, i) => <BoundaryLine key={`${b.tier}${i}`} tier={b.tier} d={path(ring)} />))}
        {antennas.map((a) => (
          <g key={a.id} transform={`translate(${X(a.s)} ${Y(a.z)})`}>
            <rect x={-3} y={-0.6 * sz} width={6} height={1.2 * sz} className="fill-white stroke-ink-900" strokeWidth={1.5} />
          </g>
        ))}
      </g>
      {/* Labels outside the clip so they stay whole. */}
      {levels.map((l, i) => (
        <text key={`lt${i}`} x={X(l.from) + 4} y={Y(l.elevationM) + Math.max(4, 0.3 * sz) + 12} className="fill-ink-900 text-[10px]">
          {l.name} {l.elevationM >= 0 ? "+" : "−"}
          {Math.abs(l.elevationM).toFixed(1)} m
        </text>
      ))}
      {obstructions.map((o, i) => (
        <text key={`ot${i}`} x={X((o.from + o.to) / 2)} y={Y(o.topM) - 4} textAnchor="middle" className="fill-ink-900 text-[10px]" stroke="white" strokeWidth={3} paintOrder="stroke">
          {o.name}
        </text>
      ))}
      {antennas.map((a) => (
        <text key={`at${a.id}`} x={X(a.s) + 6} y={Y(a.z) - 0.6 * sz - 3} className="fill-ink-900 text-[10px] font-semibold" stroke="white" strokeWidth={3} paintOrder="stroke">
          {a.id}
        </text>
      ))}
      {boundaries.map((b) => {
        const at = labelPoint(b.lines);
        if (!at) return null;
        const x = Math.min(X(at[0]) + 6, width - M.right - 4);
        return (
          <text key={`bt${b.tier}`} x={x} y={Y(at[1]) + (b.tier === "general" ? -6 : 14)} textAnchor={x > width - 200 ? "end" : "start"} className="fill-ink-900 text-[11px] font-semibold" stroke="white" strokeWidth={3.5} paintOrder="stroke">
            {b.label}
          </text>
        );
      })}
      <rect x={M.left} y={M.top} width={plotW} height={plotH} fill="none" className="stroke-ink-900" strokeWidth={1} />
      {pointer && readout.length ? (
        <g className="pointer-events-none" data-testid="section-readout">
          <circle cx={X(pointer.i * grid.step)} cy={Y(grid.z0 + pointer.k * grid.step)} r={3} className="fill-white stroke-ink-900" strokeWidth={1.5} />
          <text x={M.left + plotW - 8} y={M.top + 16} textAnchor="end" className="fill-ink-900 text-[11px] tabular-nums" stroke="white" strokeWidth={3.5} paintOrder="stroke">
            {(pointer.i * grid.step).toFixed(1)} m along, {(grid.z0 + pointer.k * grid.step).toFixed(1)} m high:{" "}
            {readout.map((r) => `${percentLabel(r.values[pointer.k * grid.ns + pointer.i])} of the ${r.label} limit`).join(" · ")}
          </text>
        </g>
      ) : null}
      {sTicks.map((s) => (
        <g key={`s${s}`}>
          <line x1={X(s)} x2={X(s)} y1={M.top + plotH} y2={M.top + plotH + 5} className="stroke-ink-900" />
          <text x={X(s)} y={M.top + plotH + 17} textAnchor="middle" className="fill-ink-700 text-[10px] tabular-nums">
            {s}
          </text>
        </g>
      ))}
      {zTicks.map((z) => (
        <g key={`z${z}`}>
          <line x1={M.left - 5} x2={M.left} y1={Y(z)} y2={Y(z)} className="stroke-ink-900" />
          <text x={M.left - 8} y={Y(z) + 3} textAnchor="end" className="fill-ink-700 text-[10px] tabular-nums">
            {z}
          </text>
        </g>
      ))}
      <text x={M.left + plotW / 2} y={height - 8} textAnchor="middle" className="fill-ink-900 text-[11px]">
        distance along the cut (m){ex > 1 ? ` · heights drawn ×${ex}` : ""}
      </text>
      <text transform={`translate(14 ${M.top + plotH / 2}) rotate(-90)`} textAnchor="middle" className="fill-ink-900 text-[11px]">
        height (m)
      </text>
    </svg>
  );
}

/** Round ticks from lo to hi every `every`. */
function ticks(lo: number, hi: number, every: number) {
  const out: number[] = [];
  for (let v = Math.ceil(lo / every) * every; v <= hi + 1e-9; v += every) out.push(Number(v.toFixed(6)));
  return out;
}

/** Where a boundary's label goes: the farthest point along the cut of its longest line. */
function labelPoint(lines: [number, number][][]): [number, number] | null {
  let best: [number, number][] | null = null;
  for (const l of lines) if (!best || l.length > best.length) best = l;
  if (!best?.length) return null;
  return best.reduce((m, p) => (p[0] > m[0] ? p : m));
}
