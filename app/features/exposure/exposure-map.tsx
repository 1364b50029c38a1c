// One level's exposure map in SVG, on the site plan: the colour field of total % of limit (viridis,
// log axis, one small image; field-image.ts), labelled contour lines, the four classes as outlines and hatching that read in
// greyscale, obstructions and access points of the level, emitters with azimuth arrows, readings
// against predictions, the worst point, and the value under the pointer.
import { memo, useId, useMemo, useState } from "react";
import { pointInPolygon, type EmitterInput } from "~/engine";
import { SitePlan } from "~/features/layout/site-plan";
import type { PlanFrame, XY } from "~/features/layout/plan-frame";
import { formatPercent } from "./colour-scale";
import { classShapes, contourShapes, extendOutside, labelCandidates, ringLength, type Ring } from "./contours";
import { fieldImage } from "./field-image";
import type { AreaView, EmitterView, ExposureResult } from "./exposure-result";
import type { ExposureOptions } from "./options";
import { pointValue, type PointValue } from "./point-value";
import { CONTOUR_PERCENTS } from "./requests";

export type MapObstruction = { id: string; name: string; polygon: XY[]; heightM: number; baseM: number };
export type MapAccessPoint = { id: string; name: string; kind: string; x: number; y: number; z: number };

type Props = {
  title: string;
  /** The engine's emitters of what is drawn (stored or what-if), for the value under the pointer. */
  engineEmitters: EmitterInput[];
  elevationM: number;
  areas: AreaView[];
  result: ExposureResult;
  options: ExposureOptions;
  obstructions: MapObstruction[];
  accessPoints: MapAccessPoint[];
  width?: number;
};

/** Stable empty lists: the plan's frame is memoised on its props' identity. */
const NONE: never[] = [];

/** Things standing on this level: within half a metre of its elevation. */
const onLevel = (z: number, level: number) => Math.abs(z - level) <= 0.5;
const pathOf = (frame: PlanFrame, rings: Ring[]) => rings.map((r) => r.map((p, i) => `${i ? "L" : "M"}${frame.toPx(p[0], p[1]).map((v) => v.toFixed(1)).join(" ")}`).join("") + "Z").join("");

export function ExposureLevelMap({ title, engineEmitters, elevationM, areas, result, options, obstructions, accessPoints, width = 960 }: Props) {
  const uid = useId().replace(/[^a-zA-Z0-9_-]/g, "");
  const [hover, setHover] = useState<PointValue | null>(null);
  const geometry = useMemo(() => areas.map((a) => surfaceGeometry(a)), [areas]);
  // Stable, so the plan's frame (and with it the memoised layers) survives pointer moves.
  const avoid = useMemo<XY[]>(() => [...result.readings.map((r) => [r.x, r.y] as XY), ...accessPoints.map((a) => [a.x, a.y] as XY), ...obstructions.map((o) => centroid(o.polygon))], [result.readings, accessPoints, obstructions]);
  const planSurfaces = useMemo(() => areas.map((a) => ({ id: a.surfaceId, name: a.name, kind: "area" as const, polygon: a.polygon, elevationM: a.elevationM, access: "public" as const })), [areas]);
  const levelObstructions = obstructions.filter((o) => onLevel(o.baseM, elevationM));
  const levelAccess = accessPoints.filter((a) => onLevel(a.z, elevationM));
  const labels = new Map(result.emitters.map((e) => [e.engineId, e.label]));

  const onMove = (p: XY | null) => {
    if (!p) return setHover(null);
    const area = areas.find((a) => pointInPolygon(p[0], p[1], a.polygon));
    if (!area) return setHover(null);
    setHover(pointValue(engineEmitters, options, p[0], p[1], area.elevationM));
  };

  const worst = areas.reduce<AreaView | null>((w, a) => (a.worstAt && (!w || a.worstPercent > w.worstPercent) ? a : w), null);
  return (
    <figure className="space-y-2">
      <SitePlan
        title={title}
        surfaces={planSurfaces}
        obstructions={NONE}
        accessPoints={NONE}
        extraPoints={NONE}
        onSiteMove={onMove}
        width={width}
      >
        {(frame) => (
          <g>
            <defs>
              <clipPath id={`${uid}-clip`}>
                <path d={pathOf(frame, areas.map((a) => a.polygon))} />
              </clipPath>
              {/* Class hatching: white strokes over the dark end of the scale, spaced apart so the colour still shows. */}
              <pattern id={`${uid}-h2`} width="7" height="7" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
                <line x1="0" y1="0" x2="0" y2="7" stroke="#ffffff" strokeWidth="1.4" />
              </pattern>
              <pattern id={`${uid}-h3`} width="7" height="7" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
                <path d="M0 0V7M0 0H7" stroke="#ffffff" strokeWidth="1.6" />
              </pattern>
            </defs>
            <FieldLayers frame={frame} geometry={geometry} uid={uid} />
            {areas.map((a) => (
              <path key={a.surfaceId} d={pathOf(frame, [a.polygon])} fill="none" className="stroke-ink-900" strokeWidth={1.5} />
            ))}
            <ContourLabels frame={frame} geometry={geometry} areas={areas} emitters={result.emitters} avoid={avoid} />
            {levelObstructions.map((o) => (
              <g key={o.id}>
                <path d={pathOf(frame, [o.polygon])} fill="url(#plan-solid)" className="stroke-graphite-600" strokeWidth={1.25} />
                <HaloText frame={frame} at={[centroid(o.polygon)[0], Math.max(...o.polygon.map((p) => p[1])) - 14 / frame.scale]} text={`${o.name} · ${o.heightM} m`} small />
              </g>
            ))}
            {levelAccess.map((a) => (
              <AccessMarker key={a.id} frame={frame} point={a} />
            ))}
            {emitterLabelPlaces(frame, result.emitters).map(({ emitter, dx, dy, anchor }) => (
              <EmitterMarker key={emitter.inventoryId} frame={frame} emitter={emitter} dx={dx} dy={dy} anchor={anchor} />
            ))}
            {result.readings
              .filter((r) => onLevel(r.z - r.heightM, elevationM) && areas.some((a) => pointInPolygon(r.x, r.y, a.polygon)))
              .map((r) => (
                <ReadingMarker key={r.id} frame={frame} at={[r.x, r.y]} label={r.label} ratio={r.ratio} above={r.abovePrediction} />
              ))}
            {worst?.worstAt ? <WorstMarker frame={frame} at={[worst.worstAt.x, worst.worstAt.y]} text={`worst ${formatPercent(worst.worstPercent)}`} /> : null}
            {hover ? <HoverBox frame={frame} value={hover} labels={labels} /> : null}
          </g>
        )}
      </SitePlan>
      <figcaption className="min-h-5 text-sm text-graphite-600" aria-live="polite" data-testid="point-readout">
        {hover
          ? `At (${hover.x.toFixed(1)}, ${hover.y.toFixed(1)}) m: ${formatPercent(hover.totalPercent)}; ${hover.top.map((t) => `${labels.get(t.id) ?? t.id} ${formatPercent(t.percent)}`).join(", ")}`
          : `${worst?.worstAt ? `Worst on this level: ${formatPercent(worst.worstPercent)} at (${worst.worstAt.x}, ${worst.worstAt.y}) m${worst.worstPercent < 1 ? ", below the colour scale's 1 % (unfilled)" : ""}. ` : ""}Point at the map for the value there and its three largest contributors.`}
      </figcaption>
    </figure>
  );
}

type Geometry = ReturnType<typeof surfaceGeometry>;

/** The colour field, class hatching and outlines, and contour lines, clipped to the surfaces; redrawn only when the values change. */
const FieldLayers = memo(function FieldLayers({ frame, geometry, uid }: { frame: PlanFrame; geometry: Geometry[]; uid: string }) {
  return (
    <g clipPath={`url(#${uid}-clip)`}>
      <rect x={0} y={0} width={frame.width} height={frame.height} className="fill-sheet" />
      {geometry.map((g, k) => {
        // The colour field: one pixel per grid node, scaled up smoothly (see field-image.ts).
        const [x, y] = frame.toPx(g.field.x, g.field.y + g.field.height);
        return <image key={`f${k}`} href={g.field.href} x={x} y={y} width={g.field.width * frame.scale} height={g.field.height * frame.scale} preserveAspectRatio="none" />;
      })}
      {geometry.map((g, k) => (
        <g key={`c${k}`}>
          {g.classes[1].rings.length ? <path d={pathOf(frame, g.classes[1].rings)} fill={`url(#${uid}-h2)`} fillRule="evenodd" /> : null}
          {g.classes[2].rings.length ? <path d={pathOf(frame, g.classes[2].rings)} fill={`url(#${uid}-h3)`} fillRule="evenodd" /> : null}
          {g.classes.map((c) => (c.rings.length ? <ClassOutline key={c.value} d={pathOf(frame, c.rings)} cls={c.value} /> : null))}
          {g.lines.map((l) => (l.rings.length ? <ContourLine key={l.value} d={pathOf(frame, l.rings)} percent={l.value} /> : null))}
        </g>
      ))}
    </g>
  );
});

const ContourLabels = memo(function ContourLabels({ frame, geometry, areas, emitters, avoid }: { frame: PlanFrame; geometry: Geometry[]; areas: AreaView[]; emitters: EmitterView[]; avoid: XY[] }) {
  return (
    <>
      {contourLabels(frame, geometry, areas, emitters, avoid).map((l, i) => (
        <HaloText key={i} frame={frame} at={l.at} text={`${l.percent} %`} bold={l.percent === 100} />
      ))}
    </>
  );
});

/** Bands, contour lines and class outlines of one surface, in site metres. */
function surfaceGeometry(a: AreaView) {
  const inside = a.classes.map((c) => c !== 255);
  const values = extendOutside(a.percent, inside, a.grid.nx, a.grid.ny);
  const classValues = extendOutside(a.classes.map((c) => (c === 255 ? 0 : c)), inside, a.grid.nx, a.grid.ny);
  return {
    field: fieldImage(a.grid, values),
    lines: contourShapes(a.grid, values, CONTOUR_PERCENTS),
    classes: classShapes(a.grid, Array.from(classValues)),
  };
}

type Box = [number, number, number, number];
const overlaps = (a: Box, b: Box) => a[0] < b[2] && b[0] < a[2] && a[1] < b[3] && b[1] < a[3];

/** Emitters inside the plan, each label put where it overlaps no earlier one: right, then left, then below, then above. */
function emitterLabelPlaces(frame: PlanFrame, emitters: EmitterView[]) {
  const { bounds } = frame;
  const boxes: Box[] = [];
  const out: { emitter: EmitterView; dx: number; dy: number; anchor: "start" | "end" }[] = [];
  for (const e of emitters) {
    if (e.x < bounds.minX || e.x > bounds.maxX || e.y < bounds.minY || e.y > bounds.maxY) continue;
    const [px, py] = frame.toPx(e.x, e.y);
    const w = 6 * (e.label.length + (e.active ? 0 : 6));
    const tries: [number, number, "start" | "end"][] = [[8, -6, "start"], [-8, -6, "end"], [8, 14, "start"], [-8, 14, "end"], [8, -18, "start"], [-8, -18, "end"]];
    let chosen = tries[0];
    for (const t of tries) {
      const x0 = t[2] === "start" ? px + t[0] : px + t[0] - w;
      const box: Box = [x0, py + t[1] - 10, x0 + w, py + t[1] + 2];
      if (!boxes.some((b) => overlaps(b, box))) {
        chosen = t;
        boxes.push(box);
        break;
      }
    }
    out.push({ emitter: e, dx: chosen[0], dy: chosen[1], anchor: chosen[2] });
  }
  return out;
}

/** One label per contour ring long enough to carry one: at a place well inside the surface and at least 40 px from emitters and other labels. */
function contourLabels(frame: PlanFrame, geometry: ReturnType<typeof surfaceGeometry>[], areas: AreaView[], emitters: EmitterView[], avoid: XY[]) {
  // Clear of emitters, readings, access points and their labels (which run to the right of them).
  const taken: XY[] = [...emitters.map((e) => frame.toPx(e.x, e.y)), ...avoid.flatMap(([x, y]) => [frame.toPx(x, y), frame.toPx(x + 40 / frame.scale, y)])];
  const out: { at: XY; percent: number }[] = [];
  const margin = 12 / frame.scale;
  const inside = (x: number, y: number) => areas.some((a) => [[-margin, -margin], [margin, -margin], [margin, margin], [-margin, margin]].every(([dx, dy]) => pointInPolygon(x + dx, y + dy, a.polygon)));
  for (const g of geometry) {
    for (const line of [...g.lines].sort((a, b) => (a.value === 100 ? -1 : b.value === 100 ? 1 : 0))) {
      for (const ring of line.rings) {
        const length = ringLength(ring);
        if (length * frame.scale < 80) continue;
        for (const p of labelCandidates(ring, Math.max(length / 12, 1))) {
          const px = frame.toPx(p[0], p[1]);
          if (!inside(p[0], p[1]) || taken.some((t) => Math.hypot(t[0] - px[0], t[1] - px[1]) < 40)) continue;
          taken.push(px);
          out.push({ at: p, percent: line.value });
          break;
        }
      }
    }
  }
  return out;
}

function centroid(points: XY[]): XY {
  const n = points.length || 1;
  return [points.reduce((s, p) => s + p[0], 0) / n, points.reduce((s, p) => s + p[1], 0) / n];
}

/** Class boundaries: dashed above the general limit, solid above the occupational, double above ten times; each with a white halo. */
function ClassOutline({ d, cls }: { d: string; cls: number }) {
  const dash = cls === 1 ? "6 3" : undefined;
  return (
    <g fill="none">
      <path d={d} stroke="#ffffff" strokeWidth={cls === 3 ? 5 : 3.5} strokeLinejoin="round" />
      <path d={d} className="stroke-ink-900" strokeWidth={cls === 3 ? 2.5 : 1.6} strokeDasharray={dash} strokeLinejoin="round" />
    </g>
  );
}

function ContourLine({ d, percent }: { d: string; percent: number }) {
  const main = percent === 100;
  return <path d={d} fill="none" className="stroke-ink-900" strokeWidth={main ? 1.6 : 0.8} strokeOpacity={main ? 1 : 0.75} strokeDasharray={main ? undefined : "2 2"} />;
}

function HaloText({ frame, at, text, bold = false, small = false }: { frame: PlanFrame; at: XY; text: string; bold?: boolean; small?: boolean }) {
  const [x, y] = frame.toPx(at[0], at[1]);
  return (
    <text x={x} y={y + 4} textAnchor="middle" className={`pointer-events-none fill-ink-900 ${small ? "text-[10px]" : "text-[11px]"} ${bold ? "font-bold" : ""}`} stroke="#ffffff" strokeWidth={3} paintOrder="stroke" strokeLinejoin="round">
      {text}
    </text>
  );
}

function AccessMarker({ frame, point }: { frame: PlanFrame; point: MapAccessPoint }) {
  const [px, py] = frame.toPx(point.x, point.y);
  return (
    <g transform={`translate(${px} ${py})`}>
      <rect x={-6} y={-6} width={12} height={12} className="fill-sheet stroke-ink-900" strokeWidth={1.5} />
      <text y={4} textAnchor="middle" className="fill-ink-900 text-[9px] font-semibold">
        {point.kind.slice(0, 1).toUpperCase()}
      </text>
      <text x={9} y={4} className="fill-ink-900 text-[10px]" stroke="#ffffff" strokeWidth={3} paintOrder="stroke">
        {point.name}
      </text>
    </g>
  );
}

/** An emitter: a black diamond and an arrow along its azimuth (clockwise from north); hollow when off. */
function EmitterMarker({ frame, emitter, dx: lx, dy: ly, anchor }: { frame: PlanFrame; emitter: EmitterView; dx: number; dy: number; anchor: "start" | "end" }) {
  const [px, py] = frame.toPx(emitter.x, emitter.y);
  const a = (emitter.azimuthDeg * Math.PI) / 180;
  const length = 22;
  const [dx, dy] = [Math.sin(a) * length, -Math.cos(a) * length];
  const off = !emitter.active;
  return (
    <g className={off ? "opacity-60" : undefined} data-emitter={emitter.label}>
      <line x1={px} y1={py} x2={px + dx} y2={py + dy} stroke="#ffffff" strokeWidth={4} />
      <line x1={px} y1={py} x2={px + dx} y2={py + dy} className="stroke-ink-900" strokeWidth={1.6} strokeDasharray={off ? "3 2" : undefined} />
      <path d="M0 -6L4 2L-4 2Z" transform={`translate(${px + dx} ${py + dy}) rotate(${emitter.azimuthDeg})`} className="fill-ink-900" stroke="#ffffff" strokeWidth={0.8} />
      <path d="M0 -5L5 0L0 5L-5 0Z" transform={`translate(${px} ${py})`} className={off ? "fill-sheet stroke-ink-900" : "fill-ink-900"} stroke="#ffffff" strokeWidth={off ? 1.5 : 1} />
      <text x={px + lx} y={py + ly} textAnchor={anchor} className="fill-ink-900 text-[10px] font-medium" stroke="#ffffff" strokeWidth={3} paintOrder="stroke">
        {emitter.label}
        {off ? " (off)" : ""}
      </text>
    </g>
  );
}

/** A reading: a circle with its ratio to the prediction; above its prediction, a heavy triangle that reads without colour. */
function ReadingMarker({ frame, at, label, ratio, above }: { frame: PlanFrame; at: XY; label: string; ratio: number | null; above: boolean }) {
  const [px, py] = frame.toPx(at[0], at[1]);
  const text = `${label.split(" ")[0]} ×${ratio === null ? "–" : ratio.toFixed(2)}`;
  return (
    <g transform={`translate(${px} ${py})`} data-reading={label} data-above={above ? "true" : "false"}>
      {above ? <path d="M0 -9L8 6H-8Z" className="fill-ink-900" stroke="#ffffff" strokeWidth={1.5} /> : <circle r={5} className="fill-sheet stroke-ink-900" strokeWidth={1.5} />}
      {above ? (
        <text y={4} textAnchor="middle" className="fill-sheet text-[9px] font-bold">
          !
        </text>
      ) : null}
      <text x={10} y={4} className={`fill-ink-900 text-[10px] ${above ? "font-bold" : ""}`} stroke="#ffffff" strokeWidth={3} paintOrder="stroke">
        {text}
      </text>
    </g>
  );
}

function WorstMarker({ frame, at, text }: { frame: PlanFrame; at: XY; text: string }) {
  const [px, py] = frame.toPx(at[0], at[1]);
  return (
    <g transform={`translate(${px} ${py})`} data-testid="worst-marker">
      <circle r={7} fill="none" stroke="#ffffff" strokeWidth={4} />
      <circle r={7} fill="none" className="stroke-ink-900" strokeWidth={2} />
      <path d="M-11 0H-4M4 0H11M0 -11V-4M0 4V11" className="stroke-ink-900" strokeWidth={1.5} />
      <text x={12} y={-9} className="fill-ink-900 text-[11px] font-bold" stroke="#ffffff" strokeWidth={3} paintOrder="stroke">
        {text}
      </text>
    </g>
  );
}

function HoverBox({ frame, value, labels }: { frame: PlanFrame; value: PointValue; labels: Map<string | null, string> }) {
  const [px, py] = frame.toPx(value.x, value.y);
  const lines = [`${formatPercent(value.totalPercent)} of limit`, ...value.top.map((t) => `${labels.get(t.id) ?? t.id}: ${formatPercent(t.percent)}`)];
  const w = 168;
  const h = 16 * lines.length + 10;
  const x = px + 14 + w > frame.width ? px - 14 - w : px + 14;
  const y = Math.max(4, Math.min(frame.height - h - 4, py - h / 2));
  return (
    <g className="pointer-events-none">
      <circle cx={px} cy={py} r={3} className="fill-ink-900" stroke="#ffffff" strokeWidth={1.5} />
      <rect x={x} y={y} width={w} height={h} rx={2} className="fill-sheet stroke-ink-900" strokeWidth={1} />
      {lines.map((l, i) => (
        <text key={i} x={x + 8} y={y + 18 + i * 16} className={`fill-ink-900 text-[11px] ${i === 0 ? "font-bold" : ""}`}>
          {l}
        </text>
      ))}
    </g>
  );
}
