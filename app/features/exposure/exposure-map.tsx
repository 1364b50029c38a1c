// One level's exposure map in SVG, on the site plan: the colour field of total % of limit (viridis,
// log axis, one small image; field-image.ts), labelled contour lines, the four classes as outlines and hatching that read in
// greyscale, obstructions and access points of the level, emitters with azimuth arrows, readings
// against predictions, the worst point, and the value under the pointer.
import { memo, useId, useMemo, useState } from "react";
import { pointInPolygon, type EmitterInput } from "~/engine";
import { SitePlan } from "~/features/layout/site-plan";
import type { PlanFrame, XY } from "~/features/layout/plan-frame";
import { formatPercent } from "./colour-scale";
import { labelCandidates, ringLength, type Ring } from "./contours";
import { geometryOf, ringsPath, type SurfaceGeometry } from "./map-geometry";
import { around, overlapArea, placeLabels, segmentBoxes, textWidth, type Box, type PlacedLabel } from "./map-labels";
import type { AreaView, EmitterView, ExposureResult } from "./exposure-result";
import type { ExposureOptions } from "./options";
import { pointValue, type PointValue } from "./point-value";

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
const pathOf = (frame: PlanFrame, rings: Ring[]) => ringsPath(rings, frame.toPx);

/** Memoised: a render of the page that keeps the same result (an edit before its answer, the pending flag) skips the map. */
export const ExposureLevelMap = memo(function ExposureLevelMap({ title, engineEmitters, elevationM, areas, result, options, obstructions, accessPoints, width = 960 }: Props) {
  const uid = useId().replace(/[^a-zA-Z0-9_-]/g, "");
  const [hover, setHover] = useState<PointValue | null>(null);
  const geometry = useMemo(() => areas.map(geometryOf), [areas]);
  const planSurfaces = useMemo(() => areas.map((a) => ({ id: a.surfaceId, name: a.name, kind: "area" as const, polygon: a.polygon, elevationM: a.elevationM, access: "public" as const })), [areas]);
  const levelAccess = useMemo(() => accessPoints.filter((a) => onLevel(a.z, elevationM)), [accessPoints, elevationM]);
  const levelObstructions = useMemo(() => obstructions.filter((o) => onLevel(o.baseM, elevationM)), [obstructions, elevationM]);
  const levelReadings = useMemo(
    () => result.readings.filter((r) => onLevel(r.z - r.heightM, elevationM) && areas.some((a) => pointInPolygon(r.x, r.y, a.polygon))),
    [result.readings, areas, elevationM],
  );
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
            {levelObstructions.map((o) => (
              <path key={o.id} d={pathOf(frame, [o.polygon])} fill="url(#plan-solid)" className="stroke-graphite-600" strokeWidth={1.25} />
            ))}
            <MarksAndLabels
              frame={frame}
              geometry={geometry}
              areas={areas}
              emitters={result.emitters}
              readings={levelReadings}
              access={levelAccess}
              obstructions={levelObstructions}
              worst={worst}
            />
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
});

type Geometry = SurfaceGeometry;

/** The colour field, class hatching and outlines, and contour lines, clipped to the surfaces; redrawn only when the values change. */
const FieldLayers = memo(function FieldLayers({ frame, geometry, uid }: { frame: PlanFrame; geometry: Geometry[]; uid: string }) {
  return (
    <g clipPath={`url(#${uid}-clip)`}>
      <rect x={0} y={0} width={frame.width} height={frame.height} className="fill-sheet" />
      {geometry.map((g, k) => {
        // The colour field: one pixel per grid node, scaled up smoothly (see field-image.ts), inside the smoothed 1 % contour.
        if (!g.floor.rings.length) return null;
        const [x, y] = frame.toPx(g.field.x, g.field.y + g.field.height);
        return (
          <g key={`f${k}`}>
            <clipPath id={`${uid}-floor-${k}`}>
              <path d={pathOf(frame, g.floor.rings)} clipRule="evenodd" />
            </clipPath>
            <image clipPath={`url(#${uid}-floor-${k})`} href={g.field.href} x={x} y={y} width={g.field.width * frame.scale} height={g.field.height * frame.scale} preserveAspectRatio="none" />
          </g>
        );
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

type LevelReading = ExposureResult["readings"][number];
type Worst = AreaView | null;

/** Every mark and label of the level, placed together so no label covers a mark or another label; redrawn only when they change. */
const MarksAndLabels = memo(function MarksAndLabels({ frame, geometry, areas, emitters, readings, access, obstructions, worst }: { frame: PlanFrame; geometry: Geometry[]; areas: AreaView[]; emitters: EmitterView[]; readings: LevelReading[]; access: MapAccessPoint[]; obstructions: MapObstruction[]; worst: Worst }) {
  const layout = useMemo(() => layoutMarks(frame, geometry, areas, emitters, readings, access, obstructions, worst), [frame, geometry, areas, emitters, readings, access, obstructions, worst]);
  return (
    <>
      {layout.contours.map((l, i) => (
        <HaloText key={i} frame={frame} at={l.at} text={`${l.percent} %`} bold={l.percent === 100} />
      ))}
      {obstructions.map((o) => (
        <LabelText key={o.id} place={layout.labels.get(`o:${o.id}`)!} text={obstructionText(o)} className="pointer-events-none fill-ink-900 text-[10px]" />
      ))}
      {access.map((a) => (
        <AccessMarker key={a.id} frame={frame} point={a} label={layout.labels.get(`a:${a.id}`)!} />
      ))}
      {layout.emitters.map((e) => (
        <EmitterMarker key={e.inventoryId} frame={frame} emitter={e} label={layout.labels.get(`e:${e.inventoryId}`)!} />
      ))}
      {readings.map((r) => (
        <ReadingMarker key={r.id} frame={frame} at={[r.x, r.y]} label={r.label} ratio={r.ratio} above={r.abovePrediction} place={layout.labels.get(`r:${r.id}`)!} />
      ))}
      {worst?.worstAt ? <WorstMarker frame={frame} at={[worst.worstAt.x, worst.worstAt.y]} text={worstText(worst)} place={layout.labels.get("worst")!} /> : null}
    </>
  );
});

const worstText = (w: AreaView) => `worst ${formatPercent(w.worstPercent)}`;
const readingText = (r: LevelReading) => `${r.label.split(" ")[0]} ×${r.ratio === null ? "–" : r.ratio.toFixed(2)}`;
const emitterText = (e: EmitterView) => `${e.label}${e.active ? "" : " (off)"}`;
const obstructionText = (o: MapObstruction) => `${o.name} · ${o.heightM} m`;
/** An obstruction's label inside its outline: at the top, else the bottom, else rows between (centred, right, left), else just outside (left edge and top of the text, px). */
function obstructionPlaces(frame: PlanFrame, o: MapObstruction): [number, number][] {
  const w = textWidth(obstructionText(o), 10);
  const xs = o.polygon.map((p) => frame.toPx(p[0], p[1]));
  const [cx] = frame.toPx(...centroid(o.polygon));
  const top = Math.min(...xs.map((p) => p[1]));
  const bottom = Math.max(...xs.map((p) => p[1]));
  const right = Math.max(...xs.map((p) => p[0])) - w - 4;
  const left = Math.min(...xs.map((p) => p[0])) + 4;
  const rows: number[] = [top + 5, bottom - 17];
  for (let y = top + 19; y < bottom - 17; y += 14) rows.push(y);
  return [...rows.flatMap((y) => [[cx - w / 2, y], [right, y], [left, y]] as [number, number][]), [cx - w / 2, top - 15], [cx - w / 2, bottom + 3]];
}
const ARROW_PX = 22;
const arrowEnd = (frame: PlanFrame, e: EmitterView): [number, number] => {
  const [px, py] = frame.toPx(e.x, e.y);
  const a = (e.azimuthDeg * Math.PI) / 180;
  return [px + Math.sin(a) * ARROW_PX, py - Math.cos(a) * ARROW_PX];
};

/** The marks' boxes, then the labels placed clear of them (worst point first, then emitters, readings, access points), then the contour labels clear of all. */
function layoutMarks(frame: PlanFrame, geometry: Geometry[], areas: AreaView[], all: EmitterView[], readings: LevelReading[], access: MapAccessPoint[], obstructions: MapObstruction[], worst: Worst) {
  const { bounds } = frame;
  const emitters = all.filter((e) => e.x >= bounds.minX && e.x <= bounds.maxX && e.y >= bounds.minY && e.y <= bounds.maxY);
  const marks: Box[] = [];
  for (const e of emitters) {
    const p = frame.toPx(e.x, e.y);
    marks.push(around(p, 6), ...segmentBoxes(p, arrowEnd(frame, e)), around(arrowEnd(frame, e), 5));
  }
  for (const a of access) marks.push(around(frame.toPx(a.x, a.y), 7));
  for (const r of readings) marks.push(around(frame.toPx(r.x, r.y), 9));
  if (worst?.worstAt) marks.push(around(frame.toPx(worst.worstAt.x, worst.worstAt.y), 12));
  const labels = placeLabels(
    [
      ...(worst?.worstAt ? [{ key: "worst", at: frame.toPx(worst.worstAt.x, worst.worstAt.y), text: worstText(worst), size: 11, bold: true, gap: 13 }] : []),
      ...emitters.map((e) => ({ key: `e:${e.inventoryId}`, at: frame.toPx(e.x, e.y), text: emitterText(e) })),
      ...readings.map((r) => ({ key: `r:${r.id}`, at: frame.toPx(r.x, r.y), text: readingText(r), bold: r.abovePrediction, gap: 10 })),
      ...access.map((a) => ({ key: `a:${a.id}`, at: frame.toPx(a.x, a.y), text: a.name, gap: 9 })),
      ...obstructions.map((o) => ({ key: `o:${o.id}`, at: frame.toPx(...centroid(o.polygon)), text: obstructionText(o), places: obstructionPlaces(frame, o) })),
    ],
    marks,
    frame,
  );
  const blocked = [...marks, ...[...labels.values()].map((l) => l.box)];
  return { emitters, labels, contours: contourLabels(frame, geometry, areas, blocked) };
}

/** One label per contour ring long enough to carry one: at a place well inside the surface, clear of every mark and label and of the other contour labels. */
function contourLabels(frame: PlanFrame, geometry: Geometry[], areas: AreaView[], blocked: Box[]) {
  const taken: Box[] = [...blocked];
  const out: { at: XY; percent: number }[] = [];
  const margin = 12 / frame.scale;
  const inside = (x: number, y: number) => areas.some((a) => [[-margin, -margin], [margin, -margin], [margin, margin], [-margin, margin]].every(([dx, dy]) => pointInPolygon(x + dx, y + dy, a.polygon)));
  for (const g of geometry) {
    for (const line of [...g.lines].sort((a, b) => (a.value === 100 ? -1 : b.value === 100 ? 1 : 0))) {
      for (const ring of line.rings) {
        const length = ringLength(ring);
        if (length * frame.scale < 80) continue;
        const w = textWidth(`${line.value} %`, 11, line.value === 100) + 8;
        for (const p of labelCandidates(ring, Math.max(length / 12, 1))) {
          const [x, y] = frame.toPx(p[0], p[1]);
          const box: Box = [x - w / 2, y - 8, x + w / 2, y + 8];
          if (!inside(p[0], p[1]) || taken.some((t) => overlapArea(t, box) > 0)) continue;
          taken.push(box);
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

/** A line from a mark to its label when the label had to move away from it. */
function Leader({ place }: { place: PlacedLabel }) {
  if (!place.leader) return null;
  const [x0, y0, x1, y1] = place.box;
  const tx = Math.max(x0, Math.min(x1, place.anchorX));
  const ty = Math.max(y0, Math.min(y1, place.anchorY));
  return <line x1={place.anchorX} y1={place.anchorY} x2={tx} y2={ty} className="stroke-graphite-600" strokeWidth={0.75} />;
}

function LabelText({ place, text, className }: { place: PlacedLabel; text: string; className: string }) {
  return (
    <>
      <Leader place={place} />
      <text x={place.x} y={place.y} className={className} stroke="#ffffff" strokeWidth={3} paintOrder="stroke">
        {text}
      </text>
    </>
  );
}

function AccessMarker({ frame, point, label }: { frame: PlanFrame; point: MapAccessPoint; label: PlacedLabel }) {
  const [px, py] = frame.toPx(point.x, point.y);
  return (
    <g>
      <g transform={`translate(${px} ${py})`}>
        <rect x={-6} y={-6} width={12} height={12} className="fill-sheet stroke-ink-900" strokeWidth={1.5} />
        <text y={4} textAnchor="middle" className="fill-ink-900 text-[9px] font-semibold">
          {point.kind.slice(0, 1).toUpperCase()}
        </text>
      </g>
      <LabelText place={label} text={point.name} className="fill-ink-900 text-[10px]" />
    </g>
  );
}

/** An emitter: a black diamond and an arrow along its azimuth (clockwise from north); hollow when off. */
function EmitterMarker({ frame, emitter, label }: { frame: PlanFrame; emitter: EmitterView; label: PlacedLabel }) {
  const [px, py] = frame.toPx(emitter.x, emitter.y);
  const [ex, ey] = arrowEnd(frame, emitter);
  const [dx, dy] = [ex - px, ey - py];
  const off = !emitter.active;
  return (
    <g className={off ? "opacity-60" : undefined} data-emitter={emitter.label}>
      <line x1={px} y1={py} x2={px + dx} y2={py + dy} stroke="#ffffff" strokeWidth={4} />
      <line x1={px} y1={py} x2={px + dx} y2={py + dy} className="stroke-ink-900" strokeWidth={1.6} strokeDasharray={off ? "3 2" : undefined} />
      <path d="M0 -6L4 2L-4 2Z" transform={`translate(${px + dx} ${py + dy}) rotate(${emitter.azimuthDeg})`} className="fill-ink-900" stroke="#ffffff" strokeWidth={0.8} />
      <path d="M0 -5L5 0L0 5L-5 0Z" transform={`translate(${px} ${py})`} className={off ? "fill-sheet stroke-ink-900" : "fill-ink-900"} stroke="#ffffff" strokeWidth={off ? 1.5 : 1} />
      <LabelText place={label} text={emitterText(emitter)} className="fill-ink-900 text-[10px] font-medium" />
    </g>
  );
}

/** A reading: a circle with its ratio to the prediction; above its prediction, a heavy triangle that reads without colour. */
function ReadingMarker({ frame, at, label, ratio, above, place }: { frame: PlanFrame; at: XY; label: string; ratio: number | null; above: boolean; place: PlacedLabel }) {
  const [px, py] = frame.toPx(at[0], at[1]);
  const text = `${label.split(" ")[0]} ×${ratio === null ? "–" : ratio.toFixed(2)}`;
  return (
    <g data-reading={label} data-above={above ? "true" : "false"}>
      <g transform={`translate(${px} ${py})`}>
        {above ? <path d="M0 -9L8 6H-8Z" className="fill-ink-900" stroke="#ffffff" strokeWidth={1.5} /> : <circle r={5} className="fill-sheet stroke-ink-900" strokeWidth={1.5} />}
        {above ? (
          <text y={4} textAnchor="middle" className="fill-sheet text-[9px] font-bold">
            !
          </text>
        ) : null}
      </g>
      <LabelText place={place} text={text} className={`fill-ink-900 text-[10px] ${above ? "font-bold" : ""}`} />
    </g>
  );
}

function WorstMarker({ frame, at, text, place }: { frame: PlanFrame; at: XY; text: string; place: PlacedLabel }) {
  const [px, py] = frame.toPx(at[0], at[1]);
  return (
    <g data-testid="worst-marker">
      <g transform={`translate(${px} ${py})`}>
        <circle r={7} fill="none" stroke="#ffffff" strokeWidth={4} />
        <circle r={7} fill="none" className="stroke-ink-900" strokeWidth={2} />
        <path d="M-11 0H-4M4 0H11M0 -11V-4M0 4V11" className="stroke-ink-900" strokeWidth={1.5} />
      </g>
      <LabelText place={place} text={text} className="fill-ink-900 text-[11px] font-bold" />
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
