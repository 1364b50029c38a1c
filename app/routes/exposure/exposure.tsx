import { Suspense, useMemo } from "react";
import { Await, Link, NavLink } from "react-router";
import { Button } from "~/components/button";
import { RfCautions } from "~/components/cautions";
import { Card, EmptyState, Notice } from "~/components/panels";
import { requireMember } from "~/features/auth/guard.server";
import { formatPercent } from "~/features/exposure/colour-scale";
import { EmitterWhatIfTable } from "~/features/exposure/emitter-what-if-table";
import { foldEvaluation } from "~/features/exposure/evaluation-choice";
import { CLASS_NAMES } from "~/features/exposure/evaluate-site";
import { ExposureLevelMap } from "~/features/exposure/exposure-map";
import {
  engineEmittersOf,
  levelsOf,
} from "~/features/exposure/exposure-result";
import {
  AreasTable,
  ContributionsTable,
  ReadingsSummaryNotice,
  ReadingsTable,
  signed,
  WorstPointsTable,
} from "~/features/exposure/exposure-tables";
import { FacadeStrip } from "~/features/exposure/facade-strip";
import { MapLegend } from "~/features/exposure/map-legend";
import { OptionsForm } from "~/features/exposure/options-form";
import { optionsToSearch, tierLabels } from "~/features/exposure/options";
import type { ExposureOutcome } from "~/features/exposure/result-cache.server";
import {
  loadExposureShell,
  type ExposureShell,
} from "~/features/exposure/site-exposure.server";
import { useWhatIf } from "~/features/exposure/use-what-if";
import { describeEdit } from "~/features/exposure/what-if";
import { scopeOf } from "~/features/sites/scope.server";
import { found } from "~/lib/responses.server";
import { staffRoles } from "~/lib/roles";
import type { Route } from "./+types/exposure";

export const meta: Route.MetaFunction = ({ data }) => [
  {
    title: data
      ? `Exposure · ${data.site.name} · Isotrope`
      : "Exposure · Isotrope",
  },
];

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember(
    { request, context },
    { roles: staffRoles },
  );
  const search = foldEvaluation(new URL(request.url).searchParams);
  return found(
    await loadExposureShell(scopeOf(member), params.siteId, search),
    "No such site in your organisation.",
  );
}

export default function ExposureSection({ loaderData }: Route.ComponentProps) {
  const { site, options, errors, exposure } = loaderData;
  const query = optionsToSearch(options).toString();
  const suffix = query ? `?${query}` : "";
  const base = `/sites/${site.id}`;
  const errorList = Object.values(errors);

  return (
    <>
      <section aria-labelledby="exposure-title" className="space-y-6">
        <div className="flex flex-wrap items-center justify-between gap-3">
          <h2 id="exposure-title" className="text-lg font-semibold">
            Exposure
          </h2>
          <nav
            aria-label="Exposure views"
            className="flex flex-wrap gap-1 text-sm"
          >
            {[
              ["Map", `${base}/exposure`],
              ["Section", `${base}/exposure/section`],
              ["3D", `${base}/exposure/solid`],
              ["Assessments", `${base}/assessments`],
            ].map(([label, to]) => (
              <NavLink
                key={label}
                to={`${to}${suffix}`}
                end
                className={({ isActive }) =>
                  `rounded-control px-3 py-1.5 ring-1 ring-rule ${isActive ? "bg-ink-900 font-medium text-sheet" : "bg-sheet text-ink-900 hover:bg-paper"}`
                }
              >
                {label}
              </NavLink>
            ))}
          </nav>
        </div>

        <Card title="Options">
          <OptionsForm options={options} />
          {errorList.length ? (
            <div className="mt-3">
              <Notice state="danger" role="alert">
                Some options could not be used and fell back to their defaults:{" "}
                {errorList.join(" ")}
              </Notice>
            </div>
          ) : null}
        </Card>

        <Suspense fallback={<Computing />}>
          <Await resolve={exposure}>
            {(outcome: ExposureOutcome) => (
              <ExposureResults shell={loaderData} outcome={outcome} />
            )}
          </Await>
        </Suspense>
      </section>
      <div className="mt-6">
        <RfCautions />
      </div>
    </>
  );
}

function Computing() {
  return (
    <p
      className="rounded-sheet border border-rule bg-sheet p-5 text-sm text-graphite-600"
      role="status"
      data-testid="exposure-computing"
    >
      Computing the exposure of every surface of this site… The map follows in
      a few seconds; the result is kept, so the next opening is quick.
    </p>
  );
}

function ExposureResults({
  shell,
  outcome,
}: {
  shell: Omit<ExposureShell, "exposure">;
  outcome: ExposureOutcome;
}) {
  const {
    site,
    options,
    input,
    generatedAt,
    obstructions,
    accessPoints,
    emitterInfo,
  } = shell;
  const { problem, computeMs, source } = outcome;
  const whatIf = useWhatIf(input, outcome.result);
  const result = whatIf.result;
  const engineList = useMemo(
    () => engineEmittersOf(input, result?.edits ?? {}),
    [input, result],
  );
  const levels = useMemo(() => levelsOf(result?.areas ?? []), [result]);
  const base = `/sites/${site.id}`;
  const tier = tierLabels[options.standard][options.tier];
  const labels = new Map(input.emitters.map((e) => [e.id, e.label]));
  const levelCard = (level: (typeof levels)[number], width: number) =>
    result ? (
      <Card key={level.elevationM} title={`${level.areas.map((a) => a.name).join(", ")} · level ${signed(level.elevationM)} m`}>
        <ExposureLevelMap
          title={`Exposure map of ${site.name}, level ${signed(level.elevationM)} m`}
          elevationM={level.elevationM}
          areas={level.areas}
          result={result}
          engineEmitters={engineList}
          options={options}
          obstructions={obstructions}
          accessPoints={accessPoints}
          width={width}
        />
      </Card>
    ) : null;
  return (
    <div
      className="space-y-6"
      data-testid="exposure-results"
      data-what-if={whatIf.active ? "on" : "off"}
      data-what-if-pending={whatIf.pending ? "true" : "false"}
    >
        {problem ? (
          <Notice state="danger" role="alert">
            {problem}
          </Notice>
        ) : null}

        {result && !problem ? (
          <>
            <WhatIfBar
              active={whatIf.active}
              pending={whatIf.pending}
              state={whatIf.state}
              error={whatIf.error}
              computeMs={whatIf.timing?.resultMs ?? null}
              edits={Object.entries(result.edits).map(
                ([id, e]) => `${labels.get(id) ?? id}: ${describeEdit(e)}`,
              )}
              onReset={whatIf.reset}
              serverMs={computeMs}
              source={source}
            />

            <Summary result={result} tier={tier} />
            <ReadingsSummaryNotice result={result} />

            {result.areas.length === 0 && result.facades.length === 0 ? (
              <EmptyState title="Nothing to map yet">
                Draw the walkable surfaces in{" "}
                <Link to={base} className="link">
                  Layout
                </Link>{" "}
                and record the emitters; the map then follows.
              </EmptyState>
            ) : null}

            {levels.length > 0 ? levelCard(levels[0], 960) : null}
            {levels.length > 1 ? (
              // The other levels side by side on wide screens.
              <div className="grid gap-6 lg:grid-cols-2">{levels.slice(1).map((l) => levelCard(l, 560))}</div>
            ) : null}

            {result.facades.map((f) => (
              <Card key={f.surfaceId} title={`${f.name} · facade`}>
                <FacadeStrip facade={f} />
              </Card>
            ))}

            <Card title="Legend">
              <MapLegend
                options={options}
                generatedAt={generatedAt}
                whatIf={whatIf.active}
              />
            </Card>

            <Card title="Worst point of each surface">
              <WorstPointsTable result={result} />
            </Card>
            <Card title="Emitters and what-if">
              <p className="mb-3 text-sm text-graphite-600">
                Switch emitters off, change their power, azimuth or downtilt:
                the map and the tables recompute in this browser. Nothing is
                saved; the inventory is edited under Emitters.
              </p>
              <EmitterWhatIfTable
                result={result}
                stored={input.emitters}
                info={emitterInfo}
                patterns={input.patterns}
                options={options}
                edits={whatIf.edits}
                onEdit={whatIf.setEdit}
              />
            </Card>
            <Card title="Contributions at each surface's worst point (% of limit)">
              <ContributionsTable result={result} />
            </Card>
            <Card title="Area in each class (m²)">
              <p className="mb-3 text-sm text-graphite-600">
                The four categories of 47 CFR §1.1307(b)(2) and (b)(4), against
                this standard's two limits.
              </p>
              <AreasTable result={result} />
            </Card>
            {result.readings.length ? (
              <Card title="Readings against predictions">
                <p className="mb-3 text-sm text-graphite-600">
                  Each reading beside the prediction at its point and height.
                  Broadband readings are compared as power density; their % of
                  the limit is taken at the predicted mix of frequencies.
                </p>
                <ReadingsTable result={result} />
              </Card>
            ) : null}
          </>
        ) : null}
    </div>
  );
}

function Summary({
  result,
  tier,
}: {
  result: NonNullable<ReturnType<typeof useWhatIf>["result"]>;
  tier: string;
}) {
  const w = result.summary.worstAt;
  const cls = [...result.areas, ...result.facades].reduce(
    (m, s) => Math.max(m, s.worstClass),
    0,
  );
  return (
    <div
      className="grid gap-4 rounded-sheet border border-ink-900 bg-sheet p-5 sm:grid-cols-[auto_1fr]"
      data-testid="site-worst"
    >
      <div>
        <p className="label-caps">Worst point</p>
        <p
          className="figures text-3xl font-bold text-ink-900"
          data-testid="site-worst-percent"
        >
          {formatPercent(result.summary.worstPercent)}
        </p>
        <p className="text-sm text-graphite-600">of the {tier} limit</p>
      </div>
      <div className="self-center text-sm text-ink-900">
        {w ? (
          <p>
            On <strong>{w.surfaceName}</strong> at{" "}
            <span className="figures">
              ({w.x}, {w.y}, {w.z}) m
            </span>
            . The worst class on the site: <strong>{CLASS_NAMES[cls]}</strong>.
          </p>
        ) : (
          <p>No emitter is active: nothing is predicted.</p>
        )}
      </div>
    </div>
  );
}

function WhatIfBar({
  active,
  pending,
  state,
  error,
  computeMs,
  edits,
  onReset,
  serverMs,
  source,
}: {
  active: boolean;
  pending: boolean;
  state: string;
  error: string | null;
  computeMs: number | null;
  edits: string[];
  onReset: () => void;
  serverMs: number;
  source: ExposureOutcome["source"];
}) {
  if (!active)
    return (
      <p className="text-sm text-graphite-600" data-testid="what-if-state">
        Showing the stored inventory (computed on the server in{" "}
        <span className="figures">{serverMs} ms</span>
        {source === "computed" ? "" : ", kept from an earlier opening"}). Edits under “Emitters
        and what-if” recompute here, not saved.
        {state === "starting" ? " Preparing the what-if calculator…" : ""}
      </p>
    );
  return (
    <div
      className="flex flex-wrap items-center justify-between gap-3 rounded-sheet border-2 border-dashed border-ink-900 bg-paper px-4 py-3"
      role="status"
      data-testid="what-if-state"
    >
      <div className="min-w-0 text-sm text-ink-900">
        <p className="font-bold">
          What-if, not saved
          {pending
            ? " · recomputing…"
            : computeMs !== null
              ? ` · recomputed in ${Math.round(computeMs)} ms`
              : ""}
        </p>
        <p className="[overflow-wrap:anywhere]">{edits.join("; ")}</p>
        {error ? <p className="text-danger-700">{error}</p> : null}
      </div>
      <Button type="button" tone="secondary" size="sm" onClick={onReset}>
        Reset to the stored inventory
      </Button>
    </div>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
