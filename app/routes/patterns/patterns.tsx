import { useMemo, useState } from "react";
import { readFormData } from "~/lib/form.server";
import { data, Link, useFetcher } from "react-router";
import { Button } from "~/components/button";
import { Card, EmptyState, PageHeader } from "~/components/panels";
import { requireMember } from "~/features/auth/guard.server";
import { PatternCreator } from "~/features/emitters/pattern-creator";
import { listPatterns, deletePattern } from "~/features/emitters/patterns.server";
import { patternCuts } from "~/features/emitters/polar";
import { PatternPolars } from "~/features/emitters/polar-diagram";
import { parametricLabels, type ParametricKind } from "~/features/emitters/schemas";
import type { PatternSpec } from "~/engine/patterns";
import { actorOf } from "~/features/sites/scope.server";
import { DomainError } from "~/lib/domain-error";
import { canEditInventory, inventoryEditors, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/patterns";

export const meta: Route.MetaFunction = () => [{ title: "Pattern library · Isotrope" }];

export async function loader({ request, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: staffRoles });
  const rows = await listPatterns(member.organizationId);
  return { canEdit: canEditInventory(member.role), patterns: rows.map((p) => ({ id: p.id, name: p.name, maker: p.maker, model: p.model, kind: p.kind, gainDbi: p.gainDbi, frequencyMHz: p.frequencyMHz, hBeamwidthDeg: p.hBeamwidthDeg, vBeamwidthDeg: p.vBeamwidthDeg, notes: p.notes, pattern: p.pattern as PatternSpec, uses: p.uses })) };
}

export async function action({ request, context }: Route.ActionArgs) {
  const member = await requireMember({ request, context }, { roles: inventoryEditors });
  const form = await readFormData(request);
  if (form.get("intent") !== "delete-pattern") return data({ ok: false, message: "That form is not known here. Reload the page.", sites: [] }, { status: 400 });
  try {
    await deletePattern(actorOf(member), String(form.get("id") ?? ""));
    return data({ ok: true, message: "Pattern deleted.", sites: [] });
  } catch (error) {
    if (!(error instanceof DomainError)) throw error;
    return data({ ok: false, message: error.message, sites: (error.details?.sites ?? []) as { id: string; name: string }[] }, { status: error.status });
  }
}

type PatternView = Route.ComponentProps["loaderData"]["patterns"][number];

function kindLabel(kind: string) {
  return kind === "tabulated" ? "Tabulated cuts" : (parametricLabels[kind as ParametricKind] ?? kind);
}

function DeletePattern({ pattern }: { pattern: PatternView }) {
  const fetcher = useFetcher<typeof action>();
  const [asking, setAsking] = useState(false);
  const answer = fetcher.state === "idle" ? fetcher.data : undefined;
  if (!asking)
    return (
      <Button size="sm" tone="secondary" onClick={() => setAsking(true)} aria-label={`Delete pattern ${pattern.name}`}>
        Delete…
      </Button>
    );
  return (
    <fetcher.Form method="post" className="max-w-sm space-y-2">
      <input type="hidden" name="intent" value="delete-pattern" />
      <input type="hidden" name="id" value={pattern.id} />
      <div className="flex gap-2">
        <Button size="sm" tone="danger" disabled={fetcher.state !== "idle"}>
          Delete {pattern.uses ? "(in use)" : "it"}
        </Button>
        <Button size="sm" type="button" tone="quiet" onClick={() => setAsking(false)}>
          Keep
        </Button>
      </div>
      {answer && !answer.ok ? (
        <div role="alert" className="text-sm text-danger-700">
          <p>{answer.message}</p>
          {answer.sites.length ? (
            <ul className="mt-1 list-disc pl-5">
              {answer.sites.map((s) => (
                <li key={s.id}>
                  <Link to={`/sites/${s.id}/emitters`} className="link">
                    {s.name}
                  </Link>
                </li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}
    </fetcher.Form>
  );
}

function PatternCard({ pattern, canEdit }: { pattern: PatternView; canEdit: boolean }) {
  const cuts = useMemo(() => patternCuts(pattern.pattern), [pattern.pattern]);
  const facts = [
    kindLabel(pattern.kind),
    pattern.gainDbi !== null ? `${pattern.gainDbi} dBi` : null,
    pattern.frequencyMHz !== null ? `${pattern.frequencyMHz} MHz` : null,
    pattern.hBeamwidthDeg && pattern.vBeamwidthDeg ? `${pattern.hBeamwidthDeg}° × ${pattern.vBeamwidthDeg}°` : null,
    `${pattern.uses} emitter${pattern.uses === 1 ? "" : "s"}`,
  ].filter(Boolean);
  return (
    <li className="rounded-sheet border border-rule bg-sheet p-4">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div className="min-w-0">
          <h3 className="text-base font-semibold break-words">{pattern.name}</h3>
          <p className="text-sm break-words text-graphite-600">{[pattern.maker, pattern.model].filter(Boolean).join(" · ") || "—"}</p>
          <p className="figures mt-1 text-sm text-ink-700">{facts.join(" · ")}</p>
          {pattern.notes ? <p className="mt-1 max-w-prose text-sm break-words text-graphite-600">{pattern.notes}</p> : null}
        </div>
        {canEdit ? <DeletePattern pattern={pattern} /> : null}
      </div>
      <div className="mt-3">
        <PatternPolars horizontal={cuts.horizontal} vertical={cuts.vertical} name={pattern.name} size={220} />
      </div>
    </li>
  );
}

export default function PatternsPage({ loaderData }: Route.ComponentProps) {
  const { patterns, canEdit } = loaderData;
  return (
    <div className="space-y-6">
      <PageHeader title="Pattern library">
        <p>Antenna patterns your organisation's emitters can use: tabulated horizontal and vertical cuts, or a parametric reference model.</p>
      </PageHeader>
      {patterns.length ? (
        <ul className="grid gap-4 xl:grid-cols-2">
          {patterns.map((p) => (
            <PatternCard key={p.id} pattern={p} canEdit={canEdit} />
          ))}
        </ul>
      ) : (
        <EmptyState title="No patterns yet">{canEdit ? "Add one below: upload its cuts as CSV, or choose a parametric model." : "An engineer adds them here."}</EmptyState>
      )}
      {canEdit ? (
        <Card title="Add a pattern">
          <PatternCreator />
        </Card>
      ) : null}
    </div>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
