// The elevation view's page body: choose the cut (an emitter's boresight, or two points clicked on
// the small plan), compute it in the browser with the engine, draw it with its key and summary.
import { useEffect, useMemo, useState } from "react";
import type { EmitterInput, StandardId, Tier } from "~/engine";
import { SitePlan, type PlanSurface } from "~/features/layout/site-plan";
import { boundsOf } from "~/features/layout/plan-frame";
import { percentLabel } from "./colour-scale";
import { tierLabels, type ExposureOptions } from "./options";
import { SectionChart } from "./section-chart";
import { boundaryLines, sectionField, sectionMaximum } from "./section-field";
import { boresightCut, emittersNearCut, heightSpan, levelsInSection, obstructionsInSection, sectionGrid, strongestEmitter, type Cut, type ObstructionLike, type XY } from "./section-geometry";
import { BoundaryKey, ColourLegend } from "./section-legend";
import { EmitterMarks } from "./view-plan-marks";

type Props = { emitters: EmitterInput[]; surfaces: PlanSurface[]; obstructions: ObstructionLike[]; options: ExposureOptions };

const shortTier = (standard: StandardId, tier: Tier) => tierLabels[standard][tier].split(" / ")[0];

export function SectionView({ emitters, surfaces, obstructions, options }: Props) {
  const siteBox = useMemo(() => boundsOf(surfaces.flatMap((s) => [...(s.polygon ?? []), ...(s.line ?? [])])), [surfaces]);
  const strongest = useMemo(() => strongestEmitter(emitters), [emitters]);
  const [through, setThrough] = useState<string>(strongest ? `emitter:${strongest.id}` : "points");
  const [clicked, setClicked] = useState<XY[]>([]);

  const cut: Cut | null = useMemo(() => {
    if (through.startsWith("emitter:")) {
      const e = emitters.find((x) => `emitter:${x.id}` === through);
      return e ? boresightCut(e, siteBox) : null;
    }
    return clicked.length === 2 && Math.hypot(clicked[1][0] - clicked[0][0], clicked[1][1] - clicked[0][1]) > 0.5 ? { a: clicked[0], b: clicked[1] } : null;
  }, [through, clicked, emitters, siteBox]);

  const [result, setResult] = useState<ReturnType<typeof computeSection> | null>(null);
  useEffect(() => {
    if (!cut || !emitters.length) return setResult(null);
    setResult(computeSection(cut, emitters, surfaces, obstructions, options));
  }, [cut, emitters, surfaces, obstructions, options]);

  const onPlanClick = (p: XY) => {
    const snapped: XY = [Math.round(p[0] * 10) / 10, Math.round(p[1] * 10) / 10];
    setThrough("points");
    setClicked((c) => (c.length >= 2 ? [snapped] : [...c, snapped]));
  };

  const tier = options.tier;
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_20rem]">
      <div className="min-w-0 space-y-3">
        {result ? (
          <>
            <SectionChart
              grid={result.grid}
              values={result.field[tier]}
              readout={(["general", "occupational"] as const).map((t) => ({ label: shortTier(options.standard, t), values: result.field[t] }))}
              boundaries={result.boundaries.map((b) => ({ ...b, label: `100 % ${shortTier(options.standard, b.tier)}` }))}
              levels={result.levels}
              obstructions={result.obstructions}
              antennas={result.antennas}
              people={{ fromM: options.heights.fromM, toM: options.heights.toM }}
            />
            <p className="text-sm text-ink-900" data-testid="section-summary">
              Highest on this cut: <span className="figures">{percentLabel(result.max.percent)}</span> of the {shortTier(options.standard, tier)} limit, {result.max.s.toFixed(1)} m along at{" "}
              {result.max.z.toFixed(1)} m.{" "}
              {result.boundaries
                .filter((b) => !b.lines.length)
                .map((b) => `No point of the cut reaches 100 % of the ${shortTier(options.standard, b.tier)} limit.`)
                .join(" ")}{" "}
              <span className="text-graphite-600">
                Computed in your browser in <span className="figures">{result.ms.toFixed(0)} ms</span> ({result.grid.ns} × {result.grid.nz} points, {result.grid.step.toFixed(2)} m apart).
              </span>
            </p>
          </>
        ) : (
          <p className="rounded-sheet border border-rule bg-sheet p-5 text-sm text-graphite-600">{emitters.length ? (cut ? "Computing the cut…" : "Click two points on the plan to draw a cut.") : "No emitter is on air at this site, so there is nothing to show."}</p>
        )}
      </div>
      <div className="space-y-4">
        <div>
          <label htmlFor="cut-through" className="block text-sm font-medium text-ink-900">
            Cut through
          </label>
          <select id="cut-through" value={through} onChange={(e) => setThrough(e.target.value)} className="mt-1 w-full rounded-control border border-rule-strong bg-sheet px-2 py-1.5 text-sm">
            {emitters.map((e) => (
              <option key={e.id} value={`emitter:${e.id}`}>
                {e.id} along its boresight ({e.azimuthDeg ?? 0}°)
              </option>
            ))}
            <option value="points">two points clicked on the plan</option>
          </select>
          <p className="mt-1 text-xs text-graphite-600">Or click two points on the plan below.</p>
        </div>
        <SitePlan title="Plan: where the cut runs" surfaces={surfaces} obstructions={obstructions} extraPoints={cut ? [cut.a, cut.b] : undefined} width={480} onSiteClick={(p) => onPlanClick(p)} draft={through === "points" && clicked.length === 1 ? clicked : undefined}>
          {(frame) => (
            <>
              <EmitterMarks frame={frame} emitters={emitters} />
              {cut ? (
                <g>
                  <line {...lineProps(frame.toPx(...cut.a), frame.toPx(...cut.b))} className="stroke-flag-600" strokeWidth={2.5} />
                  <text {...labelProps(frame.toPx(...cut.a))} className="fill-flag-700 text-[11px] font-semibold">
                    A
                  </text>
                  <text {...labelProps(frame.toPx(...cut.b))} className="fill-flag-700 text-[11px] font-semibold">
                    B
                  </text>
                </g>
              ) : null}
            </>
          )}
        </SitePlan>
        {cut ? (
          <p className="text-xs text-graphite-600">
            Cut from A ({cut.a[0]}, {cut.a[1]}) to B ({cut.b[0]}, {cut.b[1]}) m; distances are measured from A.
          </p>
        ) : null}
        <ColourLegend
          caption={`% of the ${shortTier(options.standard, tier)} limit`}
          keys={(["general", "occupational"] as const).map((t) => ({ label: `100 % of the ${shortTier(options.standard, t)} limit`, line: <BoundaryKey tier={t} /> }))}
        />
        <p className="text-xs text-graphite-600">Hatched band: where people stand, {options.heights.fromM}–{options.heights.toM} m above each walkable level. Grey blocks: obstructions in section.</p>
      </div>
    </div>
  );
}

function computeSection(cut: Cut, emitters: EmitterInput[], surfaces: PlanSurface[], obstructions: ObstructionLike[], options: ExposureOptions) {
  const started = performance.now();
  const areas = surfaces.map((s) => ({ id: s.id, name: s.name, kind: s.kind, polygon: s.polygon ?? null, elevationM: s.elevationM ?? 0, access: s.access }));
  const levels = levelsInSection(cut, areas);
  const blocks = obstructionsInSection(cut, obstructions);
  const [zMin, zMax] = heightSpan(levels.length ? levels : areas.map((a) => ({ elevationM: a.elevationM ?? 0 })), [...emitters.map((e) => e.position.z), ...blocks.map((b) => b.topM)]);
  const grid = sectionGrid(cut, zMin, zMax);
  const field = sectionField(emitters, options.standard, grid);
  const boundaries = boundaryLines(field, grid);
  const ms = performance.now() - started;
  performance.mark("section-computed", { detail: { ms } });
  return { grid, field, boundaries, levels, obstructions: blocks, antennas: emittersNearCut(cut, emitters), max: sectionMaximum(field[options.tier], grid), ms };
}

const lineProps = (a: XY, b: XY) => ({ x1: a[0], y1: a[1], x2: b[0], y2: b[1] });
const labelProps = (p: XY) => ({ x: p[0] + 5, y: p[1] - 5 });
