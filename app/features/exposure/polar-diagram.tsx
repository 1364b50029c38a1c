// An antenna pattern as two small polar diagrams: the horizontal cut turned to the emitter's
// azimuth (north up, as on the plan) and the vertical cut seen from the side (boresight to the
// right, tilted down). Radius: relative gain in dB, 0 dB at the rim, −30 dB at the centre.
import { memo } from "react";
import { patternAttenuationDb, preparePattern } from "~/engine";
import type { EnginePattern } from "~/infra/db/schema/emitters";

const FLOOR_DB = 30;
const R = 26;

/** Cuts by pattern object: a library pattern is one object for the page's life, so redraws after a what-if edit reuse its cuts. */
const cache = new WeakMap<object, { h: [number, number][]; v: [number, number][] }>();

function cuts(pattern: EnginePattern) {
  const key = typeof pattern === "object" ? pattern : null;
  const hit = key ? cache.get(key) : undefined;
  if (hit) return hit;
  const p = preparePattern(pattern);
  const out = { h: cut(p, "h"), v: cut(p, "v") };
  if (key) cache.set(key, out);
  return out;
}

function cut(p: ReturnType<typeof preparePattern>, plane: "h" | "v") {
  const pts: [number, number][] = [];
  for (let d = -180; d <= 180; d += 3) {
    const a = (d * Math.PI) / 180;
    const att = plane === "h" ? patternAttenuationDb(p, a, 0) : patternAttenuationDb(p, 0, a);
    pts.push([a, Math.max(0, 1 - Math.min(FLOOR_DB, Math.max(0, att)) / FLOOR_DB)]);
  }
  return pts;
}

type Props = { pattern: EnginePattern; azimuthDeg: number; tiltDeg: number; label: string };

function Diagrams({ pattern, azimuthDeg, tiltDeg, label }: Props) {
  const { h, v } = cuts(pattern);
  // Horizontal: bearing = azimuth + φ, clockwise from north (up).
  const hPath = h.map(([a, r], i) => {
    const b = a + (azimuthDeg * Math.PI) / 180;
    return `${i ? "L" : "M"}${(Math.sin(b) * r * R).toFixed(1)} ${(-Math.cos(b) * r * R).toFixed(1)}`;
  }).join("") + "Z";
  // Vertical: θ positive below the tilted boresight; boresight points right, tiltDeg below the horizon.
  const vPath = v.map(([a, r], i) => {
    const b = a + (tiltDeg * Math.PI) / 180;
    return `${i ? "L" : "M"}${(Math.cos(b) * r * R).toFixed(1)} ${(Math.sin(b) * r * R).toFixed(1)}`;
  }).join("") + "Z";
  return (
    <div className="flex gap-1" aria-label={`${label}: antenna pattern, horizontal and vertical cuts`} role="img">
      <Frame title="H">
        <path d={hPath} className="fill-paper-deep stroke-ink-900" strokeWidth={1} />
        <text y={-R - 2} textAnchor="middle" className="fill-graphite-600 text-[7px]">N</text>
      </Frame>
      <Frame title="V">
        <line x1={-R} x2={R} y1={0} y2={0} className="stroke-rule-strong" strokeWidth={0.5} />
        <path d={vPath} className="fill-paper-deep stroke-ink-900" strokeWidth={1} />
      </Frame>
    </div>
  );
}

/** Redrawn only when the emitter's pattern, azimuth or tilt changes: a what-if result carries the own patterns as new but equal objects. */
export const PolarDiagrams = memo(
  Diagrams,
  (a: Props, b: Props) =>
    a.azimuthDeg === b.azimuthDeg && a.tiltDeg === b.tiltDeg && a.label === b.label && (a.pattern === b.pattern || JSON.stringify(a.pattern) === JSON.stringify(b.pattern)),
);

function Frame({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <svg viewBox={`${-R - 4} ${-R - 9} ${2 * R + 8} ${2 * R + 13}`} className="h-14 w-14" aria-hidden="true">
      {[1, 2 / 3, 1 / 3].map((k) => (
        <circle key={k} r={k * R} fill="none" className="stroke-rule" strokeWidth={0.6} />
      ))}
      {children}
      <text x={-R - 2} y={-R - 2} className="fill-graphite-600 text-[7px]">{title}</text>
    </svg>
  );
}
