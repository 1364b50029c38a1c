// Emitters on a plan of the exposure views: a marker at the antenna with an arrow along its
// azimuth and its label. Drawn as a SitePlan layer (site metres through frame.toPx).
import type { EmitterInput } from "~/engine";
import type { PlanFrame } from "~/features/layout/plan-frame";
import { bearingVector } from "./section-geometry";

export function EmitterMarks({ frame, emitters, labels = true, dim = [] }: { frame: PlanFrame; emitters: EmitterInput[]; labels?: boolean; dim?: string[] }) {
  return (
    <g>
      {emitters.map((e) => {
        const [px, py] = frame.toPx(e.position.x, e.position.y);
        const [ux, uy] = bearingVector(e.azimuthDeg ?? 0);
        const off = dim.includes(e.id);
        return (
          <g key={e.id} opacity={off ? 0.45 : 1}>
            <line x1={px} y1={py} x2={px + ux * 16} y2={py - uy * 16} className="stroke-ink-900" strokeWidth={1.5} />
            <path d="M0 -4 L3.5 3 L-3.5 3 Z" transform={`translate(${px + ux * 17} ${py - uy * 17}) rotate(${e.azimuthDeg ?? 0})`} className="fill-ink-900" />
            <circle cx={px} cy={py} r={3.5} className={off ? "fill-white stroke-ink-900" : "fill-ink-900 stroke-white"} strokeWidth={1.25} />
            {labels ? (
              <text x={px + 5} y={py + 11} className="fill-ink-900 text-[9px]" stroke="white" strokeWidth={2.5} paintOrder="stroke">
                {e.id}
              </text>
            ) : null}
          </g>
        );
      })}
    </g>
  );
}
