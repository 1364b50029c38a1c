// The work-area planner's page body: draw the area on the plan, choose the tier and the level,
// read which emitters to reduce or switch off and by how much, and see the level's map after.
import { useMemo, useState } from "react";
import type { EmitterInput, Tier } from "~/engine";
import { Button } from "~/components/button";
import { boundsOf } from "~/features/layout/plan-frame";
import { SitePlan, type PlanAccessPoint } from "~/features/layout/site-plan";
import { percentLabel } from "./colour-scale";
import { tierLabels, type ExposureOptions } from "./options";
import { runPlanner } from "./planner-compute";
import { usePolygonDrawing } from "./planner-drawing";
import { describeChange, levelUnder, polygonArea } from "./planner-inputs";
import { LevelMapLayer, MapContours } from "./planner-map-layer";
import type { LayoutSurface, XY } from "./requests";
import type { ObstructionLike } from "./section-geometry";
import { ColourLegend } from "./section-legend";
import { EmitterMarks } from "./view-plan-marks";

type Props = { emitters: EmitterInput[]; emitterInfo: { id: string; operator: string; band: string }[]; surfaces: LayoutSurface[]; obstructions: ObstructionLike[]; accessPoints: PlanAccessPoint[]; options: ExposureOptions };

const drawOptions = { step: 0.25, closeM: 0.75 };

export function PlannerView({ emitters, emitterInfo, surfaces, obstructions, accessPoints, options }: Props) {
  const { drawing, add, undo, close, clear } = usePolygonDrawing(drawOptions);
  const [tier, setTier] = useState<Tier>("occupational");
  const [levelChoice, setLevelChoice] = useState("auto");
  const areas = surfaces.filter((s) => s.kind === "area" && s.polygon && s.polygon.length >= 3);
  const level = levelChoice === "auto" ? levelUnder(drawing.points, areas) : (areas.find((s) => s.id === levelChoice) ?? null);
  const tierName = (t: Tier) => tierLabels[options.standard][t].split(" / ")[0];
  const planSurfaces = surfaces;
  // The frame stays still while the area is drawn (its corners never move the plan under the pointer).
  const planBounds = useMemo(
    () => boundsOf([...surfaces.flatMap((s) => [...(s.polygon ?? []), ...(s.line ?? [])]), ...obstructions.flatMap((o) => o.polygon), ...accessPoints.map((a): XY => [a.x, a.y]), ...emitters.map((e): XY => [e.position.x, e.position.y])]),
    [surfaces, obstructions, accessPoints, emitters],
  );
  const marks = (frame: Parameters<typeof EmitterMarks>[0]["frame"], dim: string[] = []) => <EmitterMarks frame={frame} emitters={emitters} dim={dim} />;

  const result = useMemo(() => {
    if (!drawing.closed || !level) return null;
    if (polygonArea(drawing.points) < 0.25) return { error: "The area is too small: draw at least 0.25 m²." } as const;
    try {
      return { ok: runPlanner(drawing.points, level, surfaces, emitters, options, tier) } as const;
    } catch (error) {
      return { error: error instanceof Error ? error.message : String(error) } as const;
    }
  }, [drawing, level, surfaces, emitters, options, tier]);

  const outline = (frame: Parameters<typeof EmitterMarks>[0]["frame"], points: XY[]) => (
    <path d={points.map((p, i) => `${i ? "L" : "M"}${frame.toPx(...p).join(" ")}`).join("") + "Z"} className="fill-white/0 stroke-ink-900" fillOpacity={0} strokeWidth={3} />
  );
  const info = new Map(emitterInfo.map((e) => [e.id, e]));
  const ok = result && "ok" in result ? result.ok : null;
  const off = ok ? ok.plan.changes.filter((c) => c.switchOff).map((c) => c.id) : [];

  if (!emitters.length) return <p className="rounded-sheet border border-rule bg-sheet p-5 text-sm text-graphite-600">No emitter is on air at this site, so every work area is within the limits as predicted.</p>;
  return (
    <div className="space-y-6">
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_20rem]">
        <div className="min-w-0 space-y-2">
          <SitePlan title="Plan: click the corners of the work area" surfaces={planSurfaces} obstructions={obstructions} accessPoints={accessPoints} onSiteClick={(p) => add(p)} draft={drawing.closed ? undefined : drawing.points} bounds={planBounds}>
            {(frame) => (
              <>
                {marks(frame)}
                {drawing.closed ? outline(frame, drawing.points) : null}
              </>
            )}
          </SitePlan>
        </div>
        <div className="space-y-4 text-sm">
          <p className="text-ink-900">
            Click the corners of the area where people will work; click the first corner again (or <em>Close the area</em>) to finish. Corners snap to {drawOptions.step} m.
          </p>
          <div className="flex flex-wrap gap-2">
            <Button type="button" size="sm" tone="secondary" onClick={close} disabled={drawing.closed || drawing.points.length < 3}>
              Close the area
            </Button>
            <Button type="button" size="sm" tone="quiet" onClick={undo} disabled={!drawing.points.length || drawing.closed}>
              Undo last corner
            </Button>
            <Button type="button" size="sm" tone="quiet" onClick={clear} disabled={!drawing.points.length}>
              Start again
            </Button>
          </div>
          <p className="text-graphite-600" data-testid="planner-corners">
            {drawing.points.length} corner{drawing.points.length === 1 ? "" : "s"}
            {drawing.closed ? `, closed: ${polygonArea(drawing.points).toFixed(2)} m²` : ""}
          </p>
          <div>
            <label htmlFor="planner-tier" className="block font-medium text-ink-900">
              Limit to keep the work area under
            </label>
            <select id="planner-tier" value={tier} onChange={(e) => setTier(e.target.value as Tier)} className="mt-1 w-full rounded-control border border-rule-strong bg-sheet px-2 py-1.5">
              <option value="occupational">{tierName("occupational")} (trained workers)</option>
              <option value="general">{tierName("general")}</option>
            </select>
          </div>
          <div>
            <label htmlFor="planner-level" className="block font-medium text-ink-900">
              Level the area is on
            </label>
            <select id="planner-level" value={levelChoice} onChange={(e) => setLevelChoice(e.target.value)} className="mt-1 w-full rounded-control border border-rule-strong bg-sheet px-2 py-1.5">
              <option value="auto">the level under the area{level && levelChoice === "auto" ? ` (${level.name})` : ""}</option>
              {areas.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.name} ({(s.elevationM ?? 0).toFixed(1)} m)
                </option>
              ))}
            </select>
            {drawing.closed && !level ? <p className="mt-1 text-danger-700">The area's centre is on no walkable level: choose the level.</p> : null}
          </div>
        </div>
      </div>

      {result && "error" in result ? <p className="text-sm text-danger-700">{result.error}</p> : null}
      {ok ? (
        <section aria-labelledby="plan-title" className="space-y-4">
          <h3 id="plan-title" className="text-lg font-bold text-ink-900">
            Power-down plan for the work area
          </h3>
          <p className="text-sm text-ink-900" data-testid="planner-summary">
            Highest in the work area ({ok.cellsInArea} grid cells on {level!.name}): <span className="figures">{percentLabel(ok.plan.maxPercentBefore)}</span> of the {tierName(tier)} limit now,{" "}
            <span className="figures">{percentLabel(ok.plan.maxPercentAfter)}</span> after the changes below.{" "}
            {ok.plan.changes.length === 0
              ? "The area is within the limit already: no emitter needs to change."
              : ok.plan.feasible
                ? `${ok.plan.changes.length} emitter${ok.plan.changes.length === 1 ? "" : "s"} to change.`
                : "Even with every emitter changed the area stays over the limit: keep people out."}
          </p>
          {ok.plan.changes.length ? (
            <div className="overflow-x-auto rounded-sheet border border-rule bg-sheet">
              <table className="w-full text-left text-sm tabular-nums">
                <caption className="sr-only">Emitters to reduce or switch off</caption>
                <thead className="border-b border-rule bg-paper text-graphite-600">
                  <tr>
                    <th scope="col" className="px-3 py-2 font-medium">Emitter</th>
                    <th scope="col" className="px-3 py-2 font-medium">Operator · band</th>
                    <th scope="col" className="px-3 py-2 font-medium">Change</th>
                    <th scope="col" className="px-3 py-2 text-right font-medium">Reduction</th>
                    <th scope="col" className="px-3 py-2 text-right font-medium">Power left</th>
                  </tr>
                </thead>
                <tbody>
                  {ok.plan.changes.map((c) => (
                    <tr key={c.id} className="border-b border-rule last:border-0">
                      <th scope="row" className="px-3 py-2 font-medium text-ink-900">{c.id}</th>
                      <td className="px-3 py-2">{[info.get(c.id)?.operator, info.get(c.id)?.band].filter(Boolean).join(" · ")}</td>
                      <td className="px-3 py-2">{c.switchOff ? "switch off" : "reduce power"}</td>
                      <td className="px-3 py-2 text-right">{c.switchOff ? "—" : `${c.reductionDb!.toFixed(1)} dB`}</td>
                      <td className="px-3 py-2 text-right" title={describeChange(c)}>{(c.powerFactor * 100).toFixed(c.powerFactor > 0 && c.powerFactor < 0.1 ? 1 : 0)} %</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          ) : null}
          <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_20rem]">
            <div className="min-w-0">
              <SitePlan title={`Map of ${level!.name} after the changes`} surfaces={planSurfaces} obstructions={obstructions} accessPoints={accessPoints} bounds={planBounds}>
                {(frame) => (
                  <>
                    <LevelMapLayer frame={frame} maps={ok.after} />
                    {/* Obstructions again above the colours, so they stay visible. */}
                    {obstructions.map((o) => (
                      <path key={o.id} d={o.polygon.map((p, i) => `${i ? "L" : "M"}${frame.toPx(...p).join(" ")}`).join("") + "Z"} fill="url(#plan-solid)" className="stroke-graphite-600" strokeWidth={1.25} />
                    ))}
                    <MapContours frame={frame} maps={ok.before} dash="5 4" className="stroke-graphite-600" />
                    {marks(frame, off)}
                    {outline(frame, drawing.points)}
                  </>
                )}
              </SitePlan>
            </div>
            <div className="space-y-3 text-sm">
              <ColourLegend caption={`% of the ${tierName(tier)} limit, after`} />
              <ul className="space-y-1 text-graphite-600">
                <li>Solid black line: 100 % after the changes.</li>
                <li>Dashed grey line: 100 % now.</li>
                <li>Heavy outline: the work area. Hollow markers: emitters switched off.</li>
              </ul>
              <p className="text-xs text-graphite-600">
                {level!.name}, {options.heights.count === 1 ? `at ${options.heights.fromM} m` : `${options.mode === "average" ? "spatial average" : "maximum"} over ${options.heights.fromM}–${options.heights.toM} m`} above the level, grid {options.gridStepM} m. The planner is greedy (largest contributor first): a safe plan, not always the smallest. Computed in your browser in{" "}
                <span className="figures">{ok.ms.toFixed(0)} ms</span>.
              </p>
            </div>
          </div>
        </section>
      ) : null}
    </div>
  );
}
