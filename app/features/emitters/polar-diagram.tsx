// A pattern cut as a polar diagram in SVG: rings every 10 dB down to 40 dB below the peak, spokes
// every 30°, the cut drawn in ink. Horizontal: boresight up, angles clockwise (as seen from above);
// vertical: the horizon to the right, elevation positive up (boresight at 0°, the back to the left).
import { useId } from "react";
import type { PolarCut } from "./polar";

const RANGE_DB = 40;
const R = 100;

export function PolarDiagram({ cut, kind, title, size = 240 }: { cut: PolarCut; kind: "horizontal" | "vertical"; title: string; size?: number }) {
  const titleId = useId();
  // Screen angle (radians, clockwise from up) of a cut angle.
  const screen = (deg: number) => ((kind === "horizontal" ? deg : 90 - deg) * Math.PI) / 180;
  const at = (deg: number, r: number): [number, number] => [r * Math.sin(screen(deg)), -r * Math.cos(screen(deg))];
  const radius = (att: number) => R * Math.max(0, 1 - Math.min(att, RANGE_DB) / RANGE_DB);
  const sorted = [...cut].sort((a, b) => a.angleDeg - b.angleDeg);
  const d = sorted.map((p, i) => `${i ? "L" : "M"}${at(p.angleDeg, radius(p.attenuationDb)).map((v) => v.toFixed(2)).join(" ")}`).join("") + "Z";
  const spokes = [0, 30, 60, 90, 120, 150, 180, 210, 240, 270, 300, 330];
  const angleLabel = (deg: number) => (kind === "horizontal" ? `${deg > 180 ? deg - 360 : deg}°` : `${deg > 180 ? deg - 360 : deg}°`);
  return (
    <svg viewBox="-130 -125 260 250" width={size} height={size * (250 / 260)} role="img" aria-labelledby={titleId} className="block max-w-full">
      <title id={titleId}>{title}</title>
      {[0, 10, 20, 30].map((db) => (
        <g key={db}>
          <circle r={radius(db)} fill="none" className={db === 0 ? "stroke-graphite-500" : "stroke-rule"} strokeWidth={db === 0 ? 1 : 0.75} />
          <text x={2} y={-radius(db) + 9} fontSize={9} className="fill-graphite-600">
            {db === 0 ? "0 dB" : `−${db}`}
          </text>
        </g>
      ))}
      {spokes.map((deg) => {
        const [x, y] = at(deg, R);
        const [lx, ly] = at(deg, R + 12);
        return (
          <g key={deg}>
            <line x1={0} y1={0} x2={x} y2={y} className="stroke-rule" strokeWidth={0.5} />
            <text x={lx} y={ly + 3} textAnchor="middle" fontSize={9} className="fill-graphite-600">
              {angleLabel(deg)}
            </text>
          </g>
        );
      })}
      <path d={d} fill="none" className="stroke-ink-900" strokeWidth={1.5} strokeLinejoin="round" />
    </svg>
  );
}

/** Both cuts side by side, with their names. */
export function PatternPolars({ horizontal, vertical, name, size }: { horizontal: PolarCut; vertical: PolarCut; name: string; size?: number }) {
  return (
    <div className="flex flex-wrap gap-4">
      <figure>
        <PolarDiagram cut={horizontal} kind="horizontal" title={`${name}: horizontal cut, attenuation in dB by azimuth off boresight`} size={size} />
        <figcaption className="label-caps mt-1 text-center">Horizontal</figcaption>
      </figure>
      <figure>
        <PolarDiagram cut={vertical} kind="vertical" title={`${name}: vertical cut, attenuation in dB by elevation`} size={size} />
        <figcaption className="label-caps mt-1 text-center">Vertical</figcaption>
      </figure>
    </div>
  );
}
