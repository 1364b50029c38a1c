// Emitters on the site plan (a layer for SitePlan's `children(frame)`): a marker at each antenna's
// centre with an arrow along its azimuth, filled by operator (operator-palette.ts) and carrying the
// operator's initials and the emitter's label, so the plan reads in greyscale too. Inactive
// emitters are hollow and dashed.
import type { PlanFrame, XY } from "~/features/layout/plan-frame";
import { initials, OPERATOR_INK, OPERATOR_PALETTE, operatorColours } from "./operator-palette";

export type PlanEmitter = { id: string; label: string; operator: string; x: number; y: number; z: number; azimuthDeg: number; active: boolean };

const opName = (o: string) => o.trim() || "—";
const px1 = (v: number) => Math.round(v * 10) / 10;

export function EmitterLayer({ frame, emitters, highlightId }: { frame: PlanFrame; emitters: PlanEmitter[]; highlightId?: string | null }) {
  const colours = operatorColours(emitters.map((e) => e.operator));
  const placed: [number, number][] = [];
  return (
    <g aria-label="Emitters">
      {emitters.map((e) => {
        const [px, py] = frame.toPx(e.x, e.y);
        // Emitters mounted together (within 24 px on the plan) stack their labels instead of printing over each other.
        const crowd = placed.filter(([qx, qy]) => Math.hypot(qx - px, qy - py) < 24).length;
        placed.push([px, py]);
        const i = colours.get(opName(e.operator)) ?? 0;
        const a = (e.azimuthDeg * Math.PI) / 180;
        const [dx, dy] = [Math.sin(a), -Math.cos(a)];
        const r = 9;
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
            <text x={dx > 0.3 ? -r - 3 : r + 3} y={(dy > 0.3 ? -r : r + 8) + (dy > 0.3 ? -11 : 11) * crowd} textAnchor={dx > 0.3 ? "end" : "start"} fontSize={10} fontWeight={600} className="fill-ink-900" paintOrder="stroke" stroke="#ffffff" strokeWidth={3}>
              {e.label}
            </text>
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
