// The site plan in SVG: walkable areas, facades, obstructions, access points, an optional roof
// drawing underneath, a metre grid, north arrow and scale bar. Other features draw their own
// layers on top through `children(frame)` (emitters, readings, exposure) in site metres via
// frame.toPx. Clicks report site coordinates, so a polygon can be drawn on the plan.
import { useEffect, useId, useMemo, useRef, useState, type MouseEvent, type ReactNode } from "react";
import { areaLabelBox, areaLabelSpot, lineLabelBox, rectsOverlap, type Rect } from "./label-spot";
import { backdropCorners, boundsOf, makeFrame, scaleBarMetres, type Bounds, type PlanFrame, type XY } from "./plan-frame";

export type PlanSurface = { id: string; name: string; kind: "area" | "facade"; polygon?: XY[] | null; line?: [XY, XY] | null; elevationM?: number | null; bottomM?: number | null; topM?: number | null; access: "public" | "workers" | "none" };
export type PlanObstruction = { id: string; name: string; polygon: XY[]; heightM: number };
export type PlanAccessPoint = { id: string; name: string; kind: string; x: number; y: number };
export type PlanBackdrop = { href: string; widthPx: number; heightPx: number; p1: XY; p2: XY; distanceM: number; originX: number; originY: number; rotationDeg: number; opacity: number };

type Props = {
  title: string;
  surfaces: PlanSurface[];
  obstructions?: PlanObstruction[];
  accessPoints?: PlanAccessPoint[];
  backdrop?: PlanBackdrop | null;
  /** More points the frame must hold (emitters, readings). */
  extraPoints?: XY[];
  highlightId?: string | null;
  /** A polygon being drawn, open at its end. */
  draft?: XY[];
  /** A click on the plan, in site metres, with the frame it was drawn in (for distances in pixels). */
  onSiteClick?: (site: XY, frame: PlanFrame) => void;
  onSiteMove?: (site: XY | null) => void;
  width?: number;
  /** Holds the frame still (e.g. while a polygon is being drawn, so the plan does not jump under the pointer). */
  bounds?: Bounds | null;
  children?: (frame: PlanFrame) => ReactNode;
};

/** Height of the strip under the plan that holds the scale bar and the north arrow, so they never cover the drawing. */
const FOOTER = 40;

/** A white edge round label text, so names stay legible over hatching and a roof drawing. */
const halo = { className: "stroke-white [paint-order:stroke] [stroke-linejoin:round]", strokeWidth: 3 } as const;

const fills = { public: "url(#plan-public)", workers: "url(#plan-workers)", none: "url(#plan-none)" } as const;

/** Where the backdrop's image pixels land: scale from two points a known distance apart, then rotate about p1 and move p1 to the origin. */
export function backdropTransform(b: PlanBackdrop, frame: PlanFrame) {
  const pixelDistance = Math.hypot(b.p2[0] - b.p1[0], b.p2[1] - b.p1[1]) || 1;
  const metresPerPixel = b.distanceM / pixelDistance;
  const [ox, oy] = frame.toPx(b.originX, b.originY);
  const k = metresPerPixel * frame.scale;
  return `translate(${ox} ${oy}) rotate(${b.rotationDeg}) scale(${k}) translate(${-b.p1[0]} ${-b.p1[1]})`;
}

export function SitePlan({ title, surfaces, obstructions = [], accessPoints = [], backdrop, extraPoints = [], highlightId, draft, onSiteClick, onSiteMove, width = 960, bounds: fixedBounds, children }: Props) {
  const svgRef = useRef<SVGSVGElement>(null);
  // Drawn at the width it is shown at (once known in the browser), so labels and markers keep
  // their size on a phone and on a wide screen alike; `width` until then (server rendering).
  const [shownWidth, setShownWidth] = useState<number | null>(null);
  useEffect(() => {
    const svg = svgRef.current;
    if (!svg || typeof ResizeObserver === "undefined") return;
    const measure = () => {
      const w = Math.round(svg.clientWidth);
      if (w > 0) setShownWidth((old) => (old !== null && Math.abs(old - w) < 2 ? old : w));
    };
    measure();
    const observer = new ResizeObserver(measure);
    observer.observe(svg);
    return () => observer.disconnect();
  }, []);
  const planWidth = shownWidth ?? width;
  const titleId = useId();
  const frame = useMemo(() => {
    const points: XY[] = [...extraPoints];
    for (const s of surfaces) {
      if (s.kind === "area" && s.polygon) points.push(...s.polygon);
      if (s.kind === "facade" && s.line) points.push(...s.line);
    }
    for (const o of obstructions) points.push(...o.polygon);
    for (const a of accessPoints) points.push([a.x, a.y]);
    if (draft) points.push(...draft);
    if (backdrop) points.push(...backdropCorners(backdrop));
    return makeFrame(fixedBounds ?? boundsOf(points), { width: planWidth });
  }, [surfaces, obstructions, accessPoints, extraPoints, draft, planWidth, backdrop, fixedBounds]);

  // Area names go where the emitters, access points and other names leave room (label-spot.ts).
  // An access point's name is left out where an area's or obstruction's name had to take its
  // place (a small plan on a phone); its marker and letter stay. The names drawn are handed to the
  // layers on top (frame.labels), which keep clear of them.
  const { areaLabelSpots, accessNameShown, planLabels } = useMemo(() => {
    const taken: Rect[] = [];
    for (const [x, y] of extraPoints) {
      const [px, py] = frame.toPx(x, y);
      taken.push({ x0: px - 12, y0: py - 12, x1: px + 12, y1: py + 12 });
    }
    const accessBoxes = accessPoints.map((a) => {
      const [px, py] = frame.toPx(a.x, a.y);
      return { x0: px - 7, y0: py - 7, x1: px + 11 + a.name.length * 5.6, y1: py + 7 };
    });
    taken.push(...accessBoxes);
    const names: Rect[] = [];
    const spots = new Map<string, XY>();
    // Obstructions' names first, inside their own outlines; then the areas' names around them.
    for (const o of obstructions) {
      if (o.polygon.length < 3) continue;
      const text = obstructionText(o);
      const spot = areaLabelSpot(o.polygon.map((p) => frame.toPx(...p)), text, taken, 8, lineLabelBox);
      spots.set(o.id, spot);
      taken.push(lineLabelBox(spot, text));
      names.push(lineLabelBox(spot, text));
    }
    for (const s of surfaces) {
      if (s.kind !== "area" || !s.polygon || s.polygon.length < 3) continue;
      const spot = areaLabelSpot(s.polygon.map((p) => frame.toPx(...p)), s.name, taken);
      spots.set(s.id, spot);
      taken.push(areaLabelBox(spot, s.name));
      names.push(areaLabelBox(spot, s.name));
    }
    const nameBox = (b: Rect): Rect => ({ ...b, x0: b.x0 + 16 });
    const shown = new Set<string>();
    const drawn = [...names];
    accessPoints.forEach((a, k) => {
      const box = nameBox(accessBoxes[k]);
      if (drawn.some((n) => rectsOverlap(n, box))) return;
      shown.add(a.id);
      drawn.push(box);
    });
    return { areaLabelSpots: spots, accessNameShown: shown, planLabels: drawn };
  }, [frame, surfaces, obstructions, accessPoints, extraPoints]);

  // One object per frame and labels, so the layers' own memos (keyed on the frame) hold.
  const framed = useMemo(() => ({ ...frame, labels: planLabels }), [frame, planLabels]);

  const toSiteFromEvent = (event: MouseEvent<SVGSVGElement>): XY | null => {
    const svg = svgRef.current;
    const matrix = svg?.getScreenCTM();
    if (!svg || !matrix) return null;
    const point = new DOMPoint(event.clientX, event.clientY).matrixTransform(matrix.inverse());
    return frame.toSite(point.x, point.y);
  };

  const { bounds, scale } = frame;
  const gridStep = scale > 12 ? 1 : scale > 3 ? 5 : 10;
  const lines: ReactNode[] = [];
  for (let x = Math.ceil(bounds.minX / gridStep) * gridStep; x <= bounds.maxX; x += gridStep) {
    const px = Math.round(frame.toPx(x, 0)[0] * 10) / 10;
    const major = Math.abs(x % (gridStep * 5)) < 1e-9;
    lines.push(<line key={`x${x}`} x1={px} x2={px} y1={0} y2={frame.height} className={major ? "stroke-rule" : "stroke-rule"} />);
  }
  for (let y = Math.ceil(bounds.minY / gridStep) * gridStep; y <= bounds.maxY; y += gridStep) {
    const py = Math.round(frame.toPx(0, y)[1] * 10) / 10;
    const major = Math.abs(y % (gridStep * 5)) < 1e-9;
    lines.push(<line key={`y${y}`} y1={py} y2={py} x1={0} x2={frame.width} className={major ? "stroke-rule" : "stroke-rule"} />);
  }
  const path = (pts: XY[], close = true) => pts.map((p, i) => `${i ? "L" : "M"}${frame.toPx(...p).map((v) => v.toFixed(2)).join(" ")}`).join("") + (close ? "Z" : "");
  const [originX, originY] = frame.toPx(0, 0);
  const bar = scaleBarMetres(frame);

  return (
    <svg
      ref={svgRef}
      viewBox={`0 0 ${frame.width} ${frame.height + FOOTER}`}
      role="img"
      aria-labelledby={titleId}
      data-bounds={`${bounds.minX} ${bounds.minY} ${bounds.maxX} ${bounds.maxY}`}
      className={`block h-auto w-full select-none rounded-sheet border border-rule bg-white ${onSiteClick ? "cursor-crosshair" : ""}`}
      onClick={onSiteClick ? (e) => { const p = toSiteFromEvent(e); if (p) onSiteClick(p, frame); } : undefined}
      onMouseMove={onSiteMove ? (e) => onSiteMove(toSiteFromEvent(e)) : undefined}
      onMouseLeave={onSiteMove ? () => onSiteMove(null) : undefined}
    >
      <title id={titleId}>{title}</title>
      <defs>
        <pattern id="plan-public" width="8" height="8" patternUnits="userSpaceOnUse">
          <rect width="8" height="8" className="fill-paper" />
        </pattern>
        <pattern id="plan-workers" width="8" height="8" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <rect width="8" height="8" className="fill-paper" />
          <line x1="0" y1="0" x2="0" y2="8" className="stroke-rule" strokeWidth="2" />
        </pattern>
        <pattern id="plan-none" width="8" height="8" patternUnits="userSpaceOnUse">
          <rect width="8" height="8" className="fill-paper-deep" />
          <path d="M0 0L8 8M8 0L0 8" className="stroke-rule" strokeWidth="1" />
        </pattern>
        <pattern id="plan-solid" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <rect width="6" height="6" className="fill-rule" />
          <line x1="0" y1="0" x2="0" y2="6" className="stroke-rule-strong" strokeWidth="1.5" />
        </pattern>
      </defs>
      {backdrop ? <image href={backdrop.href} width={backdrop.widthPx} height={backdrop.heightPx} opacity={backdrop.opacity} transform={backdropTransform(backdrop, frame)} preserveAspectRatio="none" /> : null}
      <g strokeWidth="1">{lines}</g>
      <g aria-hidden="true">
        <line x1={originX - 6} x2={originX + 6} y1={originY} y2={originY} className="stroke-rule-strong" />
        <line y1={originY - 6} y2={originY + 6} x1={originX} x2={originX} className="stroke-rule-strong" />
      </g>
      {surfaces.map((s) =>
        s.kind === "area" && s.polygon && s.polygon.length >= 3 ? (
          <path key={s.id} d={path(s.polygon)} fill={fills[s.access]} fillOpacity={backdrop ? 0.6 : 1} className={s.id === highlightId ? "stroke-ink-900" : "stroke-graphite-600"} strokeWidth={s.id === highlightId ? 2.5 : 1.25} />
        ) : s.kind === "facade" && s.line ? (
          <g key={s.id}>
            <path d={path(s.line, false)} className={s.id === highlightId ? "stroke-ink-900" : "stroke-ink-700"} strokeWidth={5} strokeLinecap="butt" />
            <FacadeLabel frame={frame} line={s.line} name={s.name} />
          </g>
        ) : null,
      )}
      {obstructions.map((o) =>
        o.polygon.length >= 3 ? (
          <g key={o.id}>
            <path d={path(o.polygon)} fill="url(#plan-solid)" className="stroke-graphite-600" strokeWidth={1.25} />
            <text {...(areaLabelSpots.has(o.id) ? { x: areaLabelSpots.get(o.id)![0], y: areaLabelSpots.get(o.id)![1] } : labelAt(frame, ...centroid(o.polygon)))} className={`fill-ink-900 text-[10px] ${halo.className}`} strokeWidth={halo.strokeWidth} textAnchor="middle">
              {obstructionText(o)}
            </text>
          </g>
        ) : null,
      )}
      {/* Every area's name over every area's and obstruction's fill, so a lower level drawn later does not hide a higher one's name. */}
      {surfaces.map((s) => (s.kind === "area" && s.polygon && s.polygon.length >= 3 ? <AreaLabel key={s.id} frame={frame} surface={s} at={areaLabelSpots.get(s.id)} /> : null))}
      {accessPoints.map((a) => {
        const [px, py] = frame.toPx(a.x, a.y);
        return (
          <g key={a.id} transform={`translate(${px} ${py})`}>
            <rect x={-6} y={-6} width={12} height={12} className="fill-white stroke-ink-900" strokeWidth={1.5} />
            <text y={4} textAnchor="middle" className="fill-ink-900 text-[9px] font-semibold">
              {a.kind.slice(0, 1).toUpperCase()}
            </text>
            {accessNameShown.has(a.id) ? (
              <text x={9} y={4} className={`fill-ink-700 text-[10px] ${halo.className}`} strokeWidth={halo.strokeWidth}>
                {a.name}
              </text>
            ) : null}
          </g>
        );
      })}
      {draft && draft.length ? (
        <g>
          <path d={path(draft, false)} fill="none" className="stroke-ink-900" strokeWidth={2} strokeDasharray="5 4" />
          {draft.map((p, i) => {
            const [px, py] = frame.toPx(...p);
            return <circle key={i} cx={px} cy={py} r={i === 0 ? 5 : 3.5} className={i === 0 ? "fill-white stroke-ink-900" : "fill-ink-900"} strokeWidth={1.5} />;
          })}
        </g>
      ) : null}
      {children?.(framed)}
      <g aria-hidden="true">
        <rect x={0} y={frame.height} width={frame.width} height={FOOTER} className="fill-white" />
        <line x1={0} x2={frame.width} y1={frame.height} y2={frame.height} className="stroke-rule" />
      </g>
      <ScaleBar frame={frame} metres={bar} />
      <NorthArrow x={frame.width - 24} y={frame.height + 22} />
    </svg>
  );
}

const obstructionText = (o: PlanObstruction) => `${o.name} · ${o.heightM} m`;

function centroid(points: XY[]): XY {
  const n = points.length || 1;
  return [points.reduce((s, p) => s + p[0], 0) / n, points.reduce((s, p) => s + p[1], 0) / n];
}

function labelAt(frame: PlanFrame, x: number, y: number) {
  const [px, py] = frame.toPx(x, y);
  return { x: px, y: py };
}

function AreaLabel({ frame, surface, at }: { frame: PlanFrame; surface: PlanSurface; at?: XY }) {
  const [cx, cy] = centroid(surface.polygon ?? []);
  const { x, y } = at ? { x: at[0], y: at[1] } : labelAt(frame, cx, cy);
  const elevation = surface.elevationM ?? 0;
  return (
    <text x={x} y={y} textAnchor="middle" className={`pointer-events-none fill-ink-900 text-[11px] ${halo.className}`} strokeWidth={halo.strokeWidth}>
      <tspan x={x}>{surface.name}</tspan>
      <tspan x={x} dy={13} className="fill-graphite-600 text-[10px]">
        {elevation >= 0 ? "+" : "−"}
        {Math.abs(elevation).toFixed(1)} m
      </tspan>
    </text>
  );
}

/** The facade's name along its segment, upright whichever way the segment runs. */
function FacadeLabel({ frame, line, name }: { frame: PlanFrame; line: [XY, XY]; name: string }) {
  const [a, b] = line.map((p) => frame.toPx(...p));
  // As much of "name (facade)" as fits along the segment (about 6 px a character at 11 px).
  const room = Math.max(6, Math.floor(Math.hypot(b[0] - a[0], b[1] - a[1]) / 6));
  const full = `${name} (facade)`;
  const text = full.length <= room ? full : name.length <= room ? name : `${name.slice(0, room - 1)}…`;
  let angle = (Math.atan2(b[1] - a[1], b[0] - a[0]) * 180) / Math.PI;
  if (angle > 90) angle -= 180;
  if (angle < -90) angle += 180;
  const x = (a[0] + b[0]) / 2;
  const y = (a[1] + b[1]) / 2;
  // The label sits on the side of the segment towards the middle of the plan, so it is not cut off at an edge.
  const turn = (angle * Math.PI) / 180;
  const towardsMiddle = Math.sin(turn) * (frame.width / 2 - x) - Math.cos(turn) * (frame.height / 2 - y) >= 0;
  return (
    <text transform={`translate(${x} ${y}) rotate(${angle})`} y={towardsMiddle ? -8 : 16} textAnchor="middle" className={`fill-ink-700 text-[11px] ${halo.className}`} strokeWidth={halo.strokeWidth}>
      <title>{full}</title>
      {text}
    </text>
  );
}

function NorthArrow({ x, y }: { x: number; y: number }) {
  return (
    <g transform={`translate(${x} ${y})`} aria-hidden="true">
      <path d="M0 -12 L5 6 L0 2 L-5 6 Z" className="fill-ink-900" />
      <text x={-10} y={5} textAnchor="end" className="fill-ink-900 text-[11px] font-semibold">
        N
      </text>
    </g>
  );
}

function ScaleBar({ frame, metres }: { frame: PlanFrame; metres: number }) {
  const length = metres * frame.scale;
  const x = 16;
  const y = frame.height + 20;
  return (
    <g aria-hidden="true">
      <rect x={x} y={y - 4} width={length / 2} height={4} className="fill-ink-900" />
      <rect x={x + length / 2} y={y - 4} width={length / 2} height={4} className="fill-white stroke-ink-900" strokeWidth={1} />
      <text x={x} y={y + 12} className="fill-ink-700 text-[10px]">
        0
      </text>
      <text x={x + length} y={y + 12} textAnchor="end" className="fill-ink-700 text-[10px] tabular-nums">
        {metres} m
      </text>
    </g>
  );
}
