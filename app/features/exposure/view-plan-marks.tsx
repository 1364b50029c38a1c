// Emitters on a plan of the exposure views: a marker at the antenna with an arrow along its
// azimuth and its label, placed clear of the marks and the other labels (map-labels). Drawn as a SitePlan layer (site metres through frame.toPx).
import type { EmitterInput } from "~/engine";
import type { PlanFrame } from "~/features/layout/plan-frame";
import { useMemo } from "react";
import { around, placeLabels, segmentBoxes, type Box, type PlacedLabel } from "./map-labels";
import { bearingVector } from "./section-geometry";

export function EmitterMarks({ frame, emitters, labels = true, dim = [] }: { frame: PlanFrame; emitters: EmitterInput[]; labels?: boolean; dim?: string[] }) {
  // Labels placed clear of every emitter's dot and arrow and of each other (emitters share masts).
  const places = useMemo(() => {
    if (!labels) return new Map<string, PlacedLabel>();
    const marks: Box[] = emitters.flatMap((e) => {
      const p = frame.toPx(e.position.x, e.position.y);
      const [ux, uy] = bearingVector(e.azimuthDeg ?? 0);
      const tip: [number, number] = [p[0] + ux * 17, p[1] - uy * 17];
      return [around(p, 4.5), ...segmentBoxes(p, tip, 2.5), around(tip, 4)];
    });
    return placeLabels(emitters.map((e) => ({ key: e.id, at: frame.toPx(e.position.x, e.position.y), text: e.id, size: 9, gap: 6 })), marks, frame);
  }, [frame, emitters, labels]);
  return (
    <g>
      {emitters.map((e) => {
        const [px, py] = frame.toPx(e.position.x, e.position.y);
        const [ux, uy] = bearingVector(e.azimuthDeg ?? 0);
        const off = dim.includes(e.id);
        const place = places.get(e.id);
        return (
          <g key={e.id} opacity={off ? 0.45 : 1}>
            <line x1={px} y1={py} x2={px + ux * 16} y2={py - uy * 16} className="stroke-ink-900" strokeWidth={1.5} />
            <path d="M0 -4 L3.5 3 L-3.5 3 Z" transform={`translate(${px + ux * 17} ${py - uy * 17}) rotate(${e.azimuthDeg ?? 0})`} className="fill-ink-900" />
            <circle cx={px} cy={py} r={3.5} className={off ? "fill-white stroke-ink-900" : "fill-ink-900 stroke-white"} strokeWidth={1.25} />
            {place ? (
              <>
                {place.leader ? <line x1={px} y1={py} x2={Math.max(place.box[0], Math.min(place.box[2], px))} y2={Math.max(place.box[1], Math.min(place.box[3], py))} className="stroke-graphite-600" strokeWidth={0.75} /> : null}
                <text x={place.x} y={place.y} className="fill-ink-900 text-[9px]" stroke="white" strokeWidth={2.5} paintOrder="stroke">
                  {e.id}
                </text>
              </>
            ) : null}
          </g>
        );
      })}
    </g>
  );
}
