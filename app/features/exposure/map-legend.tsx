// The map's legend: the colour bar on its log axis, the contour lines, the four classes of
// 47 CFR §1.1307(b)(2)/(b)(4), the symbols, and the basis (standard, tier, heights, grid, date).
import { memo } from "react";
import { DateText } from "~/components/date-text";
import { bandColour, bandThresholds, colourOf, legendTicks } from "./colour-scale";
import { CLASS_NAMES } from "./evaluate-site";
import { describeHeights, standardLabels, tierLabels, type ExposureOptions } from "./options";
import { CONTOUR_PERCENTS } from "./requests";

/** Memoised: the page re-renders on every what-if edit; the legend changes only with the options or the what-if flag. */
export const MapLegend = memo(function MapLegend({ options, generatedAt, whatIf }: { options: ExposureOptions; generatedAt: string; whatIf: boolean }) {
  const bands = bandThresholds();
  const W = 360;
  return (
    <div className="grid gap-5 text-sm text-ink-900 md:grid-cols-[auto_1fr]" data-testid="map-legend">
      <div>
        <p className="label-caps mb-1">Total, % of the {tierLabels[options.standard][options.tier]} limit</p>
        <svg viewBox={`0 0 ${W + 20} 44`} className="block h-auto w-full max-w-[380px]" role="img" aria-label="Colour scale: 1 % (light) to 1000 % (dark) on a log axis; below 1 % unfilled">
          {bands.slice(0, -1).map((b, k) => (
            <rect key={b} x={10 + (k * W) / (bands.length - 1)} y={4} width={W / (bands.length - 1) + 0.5} height={14} fill={bandColour(b)} />
          ))}
          <rect x={10} y={4} width={W} height={14} fill="none" className="stroke-ink-900" strokeWidth={0.75} />
          {legendTicks().map((t) => (
            <g key={t.percent} transform={`translate(${10 + t.at * W} 0)`}>
              <line y1={18} y2={t.percent === 100 ? 26 : 22} className="stroke-ink-900" strokeWidth={t.percent === 100 ? 1.6 : 0.75} />
              <text y={36} textAnchor="middle" className={`fill-ink-900 text-[10px] ${t.percent === 100 ? "font-bold" : ""}`}>
                {t.percent}
              </text>
            </g>
          ))}
        </svg>
        <p className="mt-1 text-xs text-graphite-600">Log axis; below 1 % unfilled; 1000 % and above darkest. Contour lines at {CONTOUR_PERCENTS.join(", ")} % (100 % solid).</p>
      </div>
      <div className="grid gap-x-6 gap-y-1 sm:grid-cols-2">
        <Key swatch={<path d="M2 9H30" className="stroke-ink-900" strokeWidth={1.6} strokeDasharray="6 3" />}>Above the general-population limit (class outline)</Key>
        <Key swatch={<><rect x={2} y={2} width={28} height={14} fill={colourOf(500)!} /><path d="M2 16L16 2M12 16L26 2M22 16L30 8" stroke="#ffffff" strokeWidth={1.4} /><rect x={2} y={2} width={28} height={14} fill="none" className="stroke-ink-900" strokeWidth={1.6} /></>}>{capital(CLASS_NAMES[2])}</Key>
        <Key swatch={<><rect x={2} y={2} width={28} height={14} fill={colourOf(1000)!} /><path d="M2 16L16 2M12 16L26 2M2 6L12 16M12 2L26 16" stroke="#ffffff" strokeWidth={1.4} /><rect x={2} y={2} width={28} height={14} fill="none" className="stroke-ink-900" strokeWidth={2.5} /></>}>{capital(CLASS_NAMES[3])}</Key>
        <Key swatch={<path d="M16 4L21 9L16 14L11 9Z" className="fill-ink-900" />}>Emitter, arrow along its azimuth</Key>
        <Key swatch={<><rect x={10} y={3} width={12} height={12} className="fill-sheet stroke-ink-900" strokeWidth={1.5} /></>}>Access point (D door, H hatch, L ladder)</Key>
        <Key swatch={<rect x={4} y={3} width={24} height={12} fill="url(#plan-solid)" className="stroke-graphite-600" />}>Obstruction and its height</Key>
        <Key swatch={<circle cx={16} cy={9} r={5} className="fill-sheet stroke-ink-900" strokeWidth={1.5} />}>Reading, × measured / predicted</Key>
        <Key swatch={<path d="M16 1L24 16H8Z" className="fill-ink-900" />}>Reading above its prediction</Key>
      </div>
      <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm md:col-span-2">
        <dt className="label-caps self-center">Standard</dt>
        <dd>
          {standardLabels[options.standard]}, {tierLabels[options.standard][options.tier]}
        </dd>
        <dt className="label-caps self-center">Heights</dt>
        <dd>{describeHeights(options)}</dd>
        <dt className="label-caps self-center">Grid</dt>
        <dd className="figures">
          {options.gridStepM} m · reflection factor {options.reflectionFactor} · default model {options.defaultModel}
        </dd>
        <dt className="label-caps self-center">Computed</dt>
        <dd>
          <DateText value={generatedAt} /> {whatIf ? <strong>· what-if, not saved</strong> : "· stored inventory"}
        </dd>
      </dl>
    </div>
  );
});

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

function Key({ swatch, children }: { swatch: React.ReactNode; children: React.ReactNode }) {
  return (
    <div className="flex items-center gap-2">
      <svg viewBox="0 0 32 18" className="h-[18px] w-8 shrink-0" aria-hidden="true">
        {swatch}
      </svg>
      <span>{children}</span>
    </div>
  );
}
