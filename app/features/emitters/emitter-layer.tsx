// Emitters on the site plan (a layer for SitePlan's `children(frame)`): a marker at each antenna's
// centre with an arrow along its azimuth, filled by operator (operator-palette.ts) and carrying the
// operator's initials and the emitter's label, so the plan reads in greyscale too. Inactive
// emitters are hollow and dashed.
import { rectsOverlap, type Rect } from "~/features/layout/label-spot";
import type { PlanFrame, XY } from "~/features/layout/plan-frame";
import { initials, OPERATOR_INK, OPERATOR_PALETTE, operatorColours } from "./operator-palette";

export type PlanEmitter = { id: string; label: string; operator: string; x: number; y: number; z: number; azimuthDeg: number; active: boolean };

const opName = (o: string) => o.trim() || "—";
const px1 = (v: number) => Math.round(v * 10) / 10;

const R = 9;

/**
 * Where each emitter's label goes (offsets from its marker), or null where it would print over
 * another label (the plan's own names included, frame.labels), or, on a plan narrower than 600 px
 * (a phone), over another emitter's marker: a crowded roof keeps its markers readable and names
 * only the emitters with room; each marker's title still names it.
 * Emitters mounted together (within 24 px) stack their labels first. Common practice, no source.
 */
export function emitterLabelSpots(frame: PlanFrame, emitters: Pick<PlanEmitter, "label" | "x" | "y" | "azimuthDeg">[]) {
  const at = emitters.map((e) => frame.toPx(e.x, e.y));
  const discs: Rect[] = at.map(([x, y]) => ({ x0: x - R, y0: y - R, x1: x + R, y1: y + R }));
  const labels: Rect[] = [...(frame.labels ?? [])];
  // On a wide plan a label may cross a neighbour's marker (it stays legible on its white edge); on a phone's it may not.
  const narrow = frame.width < 600;
  return emitters.map((e, k) => {
    const [px, py] = at[k];
    const crowd = at.slice(0, k).filter(([qx, qy]) => Math.hypot(qx - px, qy - py) < 24).length;
    const a = (e.azimuthDeg * Math.PI) / 180;
    const [dx, dy] = [Math.sin(a), -Math.cos(a)];
    const w = e.label.length * 6.2;
    // Away from the arrow first; then the other side, then above or below the other way.
    for (const [flipX, flipY] of [[false, false], [true, false], [false, true], [true, true]]) {
      const end = dx > 0.3 !== flipX;
      const up = dy > 0.3 !== flipY;
      const x = end ? -R - 3 : R + 3;
      const y = (up ? -R : R + 8) + (up ? -11 : 11) * crowd;
      const box = { x0: px + (end ? x - w : x), x1: px + (end ? x : x + w), y0: py + y - 9, y1: py + y + 3 };
      const outside = box.x0 < 0 || box.y0 < 0 || box.x1 > frame.width || box.y1 > frame.height;
      if (outside || labels.some((b) => rectsOverlap(b, box)) || (narrow && discs.some((d, j) => j !== k && rectsOverlap(d, box)))) continue;
      labels.push(box);
      return { x, y, anchor: end ? ("end" as const) : ("start" as const) };
    }
    return null;
  });
}

export function EmitterLayer({ frame, emitters, highlightId }: { frame: PlanFrame; emitters: PlanEmitter[]; highlightId?: string | null }) {
  const colours = operatorColours(emitters.map((e) => e.operator));
  const spots = emitterLabelSpots(frame, emitters);
  return (
    <g aria-label="Emitters">
      {emitters.map((e, k) => {
        const [px, py] = frame.toPx(e.x, e.y);
        const spot = spots[k];
        const i = colours.get(opName(e.operator)) ?? 0;
        const a = (e.azimuthDeg * Math.PI) / 180;
        const [dx, dy] = [Math.sin(a), -Math.cos(a)];
        const r = R;
        const len = 30;
        // A tenth of a pixel is plenty: fewer digits make a lighter page (decision 0009).
        const tip: XY = [px1(dx * len), px1(dy * len)];
        const head = (s: number) => `${px1(tip[0] - dx * 8 + -dy * s * 5)},${px1(tip[1] - dy * 8 + dx * s * 5)}`;
        const fill = e.active ? OPERATOR_PALETTE[i] : "#ffffff";
        const ink = e.active ? OPERATOR_INK[i] : "#000000";
        return (
          <g key={e.id} transform={`translate(${px.toFixed(1)} ${py.toFixed(1)})`} opacity={e.active ? 1 : 0.75}>
            <title>{`${e.label} · ${opName(e.operator)} · azimuth ${e.azimuthDeg}° · z ${e.z} m${e.active ? "" : " · inactive"}`}</title>
            <line x1={px1(dx * r)} y1={px1(dy * r)} x2={tip[0]} y2={tip[1]} stroke="#000000" strokeWidth={e.id === highlightId ? 2.5 : 1.5} strokeDasharray={e.active ? undefined : "3 2"} />
            <polygon points={`${tip[0]},${tip[1]} ${head(1)} ${head(-1)}`} fill="#000000" />
            <circle r={r} fill={fill} stroke={OPERATOR_PALETTE[i]} strokeWidth={e.active ? 1 : 2.5} strokeDasharray={e.active ? undefined : "3 2"} />
            <circle r={r} fill="none" stroke="#000000" strokeWidth={e.id === highlightId ? 2 : 0.75} />
            <text y={3} textAnchor="middle" fontSize={8} fontWeight={700} fill={ink}>
              {initials(e.operator)}
            </text>
            {spot ? (
              <text x={spot.x} y={spot.y} textAnchor={spot.anchor} fontSize={10} fontWeight={600} className="fill-ink-900" paintOrder="stroke" stroke="#ffffff" strokeWidth={3}>
                {e.label}
              </text>
            ) : null}
          </g>
        );
      })}
    </g>
  );
}

/** The operators and their colours, for beside the plan. */
export function OperatorLegend({ emitters }: { emitters: Pick<PlanEmitter, "operator">[] }) {
  const colours = operatorColours(emitters.map((e) => e.operator));
  if (colours.size === 0) return null;
  return (
    <ul className="flex flex-wrap gap-x-4 gap-y-1 text-sm text-ink-700" aria-label="Operators on the plan">
      {[...colours].map(([name, i]) => (
        <li key={name} className="flex items-center gap-1.5">
          <svg width="18" height="18" aria-hidden="true">
            <circle cx="9" cy="9" r="8" fill={OPERATOR_PALETTE[i]} stroke="#000000" strokeWidth="0.75" />
            <text x="9" y="12" textAnchor="middle" fontSize="7" fontWeight="700" fill={OPERATOR_INK[i]}>
              {initials(name === "—" ? "" : name)}
            </text>
          </svg>
          {name === "—" ? "No operator" : name}
        </li>
      ))}
      <li className="flex items-center gap-1.5 text-graphite-600">
        <svg width="18" height="18" aria-hidden="true">
          <circle cx="9" cy="9" r="7" fill="#ffffff" stroke="#000000" strokeWidth="1.5" strokeDasharray="3 2" />
        </svg>
        inactive
      </li>
    </ul>
  );
}
