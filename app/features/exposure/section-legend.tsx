// The colour key of the exposure views: the log-axis viridis ramp of colour-scale.ts with its ticks,
// and optional line keys (the 100 % boundaries). One SVG, so it prints with the view.
import { useId, type ReactNode } from "react";
import { COLOUR_TICKS, colourPosition, percentColour, percentLabel } from "./colour-scale";

export function ColourLegend({ width = 320, caption, keys }: { width?: number; caption: string; keys?: { label: string; line: ReactNode }[] }) {
  const id = useId().replace(/:/g, "");
  const stops = Array.from({ length: 11 }, (_, i) => i / 10);
  const ramp = width - 24;
  return (
    <svg viewBox={`0 0 ${width} ${keys?.length ? 70 + 18 * keys.length : 58}`} width={width} className="block h-auto max-w-full" role="img" aria-label={`Colour key: ${caption}`}>
      <defs>
        <linearGradient id={`ramp-${id}`}>
          {stops.map((t) => (
            <stop key={t} offset={t} stopColor={percentColour(10 ** (t * 3))} />
          ))}
        </linearGradient>
      </defs>
      <text x={12} y={12} className="fill-ink-900 text-[11px] font-semibold">
        {caption}
      </text>
      <rect x={12} y={18} width={ramp} height={12} fill={`url(#ramp-${id})`} className="stroke-ink-900" strokeWidth={0.5} />
      {COLOUR_TICKS.map((t) => {
        const x = 12 + colourPosition(t) * ramp;
        const major = Math.log10(t) % 1 === 0;
        return (
          <g key={t}>
            <line x1={x} x2={x} y1={30} y2={major ? 35 : 33} className="stroke-ink-900" />
            {major ? (
              <text x={x} y={46} textAnchor={t === 1 ? "start" : t === 1000 ? "end" : "middle"} className="fill-ink-700 text-[10px] tabular-nums">
                {t === 1 ? "≤ " : t === 1000 ? "≥ " : ""}
                {percentLabel(t)}
              </text>
            ) : null}
          </g>
        );
      })}
      {keys?.map((k, i) => (
        <g key={k.label} transform={`translate(12 ${62 + 18 * i})`}>
          {k.line}
          <text x={36} y={4} className="fill-ink-900 text-[11px]">
            {k.label}
          </text>
        </g>
      ))}
    </svg>
  );
}

/** The line styles of the two tiers' 100 % boundaries (ink on a white halo, so they read on every colour), shared by the elevation and planner views. */
export const boundaryDash = { general: undefined, occupational: "7 4" } as const;

export function BoundaryLine({ d, tier, ...line }: { d?: string; tier: "general" | "occupational"; x1?: number; x2?: number; y1?: number; y2?: number }) {
  const dash = boundaryDash[tier];
  const Shape = d === undefined ? "line" : "path";
  return (
    <g fill="none">
      <Shape d={d} {...line} className="stroke-white" strokeWidth={4.5} strokeDasharray={dash} strokeLinejoin="round" />
      <Shape d={d} {...line} className="stroke-ink-900" strokeWidth={2} strokeDasharray={dash} strokeLinejoin="round" />
    </g>
  );
}

export function BoundaryKey({ tier }: { tier: "general" | "occupational" }) {
  return <BoundaryLine tier={tier} x1={0} x2={28} y1={0} y2={0} />;
}
