// A facade as an elevation strip: distance along the facade (from its first end) across, height
// up, on the map's colour scale, with the 100 % line, the class outlines and the worst point.
import { memo } from "react";
import { formatPercent } from "./colour-scale";
import type { Ring } from "./contours";
import type { FacadeView } from "./exposure-result";
import { facadeGeometryOf, ringsPath } from "./map-geometry";

const PAD = { left: 44, right: 12, top: 24, bottom: 30 };

/** Memoised: redrawn only when its facade's values change. */
export const FacadeStrip = memo(function FacadeStrip({ facade, width = 960 }: { facade: FacadeView; width?: number }) {
  const { along, heights } = facade;
  const length = along[along.length - 1] ?? 0;
  const bottom = heights[0] ?? 0;
  const top = heights[heights.length - 1] ?? bottom;
  const span = Math.max(length, 1);
  const scale = Math.min((width - PAD.left - PAD.right) / span, 360 / Math.max(top - bottom, 1));
  const w = span * scale;
  // The drawing sits in a full-width frame, so its text keeps the size of the plans' text.
  const shift = Math.max(0, (width - PAD.left - PAD.right - w) / 2);
  const h = Math.max(top - bottom, 0.5) * scale;
  const toPx = (s: number, z: number): [number, number] => [shift + PAD.left + s * scale, PAD.top + (top - z) * scale];
  const pathOf = (rings: Ring[]) => ringsPath(rings, toPx);
  // Built in the what-if worker beside each result (map-geometry.ts), else here and kept.
  const { field, floor, hundred, classes } = facadeGeometryOf(facade);
  const [fx, fy] = toPx(field.x, field.y + field.height);
  const ticks = (lo: number, hi: number) => {
    const every = hi - lo > 30 ? 10 : hi - lo > 10 ? 5 : 1;
    const out: number[] = [];
    for (let v = Math.ceil(lo / every) * every; v <= hi + 1e-9; v += every) out.push(v);
    return out;
  };
  const worst = facade.worstAt;
  const worstAlong = worst ? Math.hypot(worst.x - facade.line[0][0], worst.y - facade.line[0][1]) : 0;
  const clipId = `facade-${facade.surfaceId}`;
  return (
    <svg viewBox={`0 0 ${Math.max(width, PAD.left + w + PAD.right)} ${PAD.top + h + PAD.bottom}`} role="img" aria-label={`${facade.name}: elevation strip, worst ${formatPercent(facade.worstPercent)}`} className="block h-auto w-full max-w-full rounded-sheet border border-rule bg-sheet">
      <defs>
        <clipPath id={clipId}>
          <rect x={shift + PAD.left} y={PAD.top} width={w} height={h} />
        </clipPath>
      </defs>
      <g clipPath={`url(#${clipId})`}>
        <clipPath id={`${clipId}-floor`}>
          <path d={pathOf(floor.rings)} clipRule="evenodd" />
        </clipPath>
        {floor.rings.length ? <image clipPath={`url(#${clipId}-floor)`} href={field.href} x={fx} y={fy} width={field.width * scale} height={field.height * scale} preserveAspectRatio="none" /> : null}
        {classes.map((c) => (c.rings.length ? <path key={c.value} d={pathOf(c.rings)} fill="none" className="stroke-ink-900" strokeWidth={c.value === 1 ? 1.4 : 2.2} strokeDasharray={c.value === 1 ? "6 3" : undefined} /> : null))}
        {hundred.rings.length ? <path d={pathOf(hundred.rings)} fill="none" className="stroke-ink-900" strokeWidth={1.6} /> : null}
      </g>
      <rect x={shift + PAD.left} y={PAD.top} width={w} height={h} fill="none" className="stroke-ink-900" />
      {ticks(0, length).map((s) => {
        const [x, y] = toPx(s, bottom);
        return (
          <g key={`s${s}`}>
            <line x1={x} x2={x} y1={y} y2={y + 4} className="stroke-ink-900" />
            <text x={x} y={y + 15} textAnchor="middle" className="fill-graphite-600 text-[10px]">
              {s}
            </text>
          </g>
        );
      })}
      <text x={shift + PAD.left + w} y={PAD.top + h + 27} textAnchor="end" className="fill-graphite-600 text-[10px]">
        distance along the facade (m)
      </text>
      {ticks(bottom, top).map((z) => {
        const [x, y] = toPx(0, z);
        return (
          <g key={`z${z}`}>
            <line x1={x - 4} x2={x} y1={y} y2={y} className="stroke-ink-900" />
            <text x={x - 6} y={y + 3} textAnchor="end" className="fill-graphite-600 text-[10px]">
              {z}
            </text>
          </g>
        );
      })}
      <text x={shift + 4} y={PAD.top + 8} className="fill-graphite-600 text-[10px]">
        z (m)
      </text>
      {worst ? (
        <g transform={`translate(${toPx(worstAlong, worst.z).join(" ")})`}>
          <circle r={6} fill="none" stroke="#ffffff" strokeWidth={4} />
          <circle r={6} fill="none" className="stroke-ink-900" strokeWidth={2} />
          <text x={10} y={-8} className="fill-ink-900 text-[11px] font-bold" stroke="#ffffff" strokeWidth={3} paintOrder="stroke">
            worst {formatPercent(facade.worstPercent)}
          </text>
        </g>
      ) : null}
    </svg>
  );
});
