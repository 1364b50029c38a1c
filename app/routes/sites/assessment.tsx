import { data, Link } from "react-router";
import { RfCautions } from "~/components/cautions";
import { DateText } from "~/components/date-text";
import { Card } from "~/components/panels";
import { TitleBlock } from "~/components/title-block";
import { addSign, findAssessment, requireAssessment, updateMitigation } from "~/features/assessments/assessments.server";
import { AssessmentTables } from "~/features/assessments/assessment-tables";
import { ClassLegend, ClassMap } from "~/features/assessments/class-map";
import { MitigationEditor } from "~/features/assessments/mitigation-editor";
import { mitigationPatchSchema, signAddSchema } from "~/features/assessments/schemas";
import { figure } from "~/features/assessments/format";
import { assessmentView } from "~/features/assessments/view";
import { requireMember } from "~/features/auth/guard.server";
import { describeHeights, standardLabels, tierLabels } from "~/features/exposure/options";
import { actorOf, scopeOf } from "~/features/sites/scope.server";
import { redirectWithFlash } from "~/infra/flash.server";
import { domainErrorReply } from "~/lib/domain-error";
import { parseForm, readFormData } from "~/lib/form.server";
import { found } from "~/lib/responses.server";
import { canEditInventory, inventoryEditors, staffRoles } from "~/lib/roles";
import type { StandardId } from "~/engine/limits";
import type { Route } from "./+types/assessment";

export const meta: Route.MetaFunction = ({ data }) => [{ title: data ? `${data.view.name} · Assessment · Isotrope` : "Assessment · Isotrope" }];

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: staffRoles });
  const row = await findAssessment(scopeOf(member), params.assessmentId, params.siteId);
  return { view: assessmentView(found(row, "No such assessment of this site.")), canEdit: canEditInventory(member.role) };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const member = await requireMember({ request, context }, { roles: inventoryEditors });
  const formData = await readFormData(request);
  const adding = formData.get("intent") === "add-sign";
  const submission = adding ? await parseForm(formData, signAddSchema) : await parseForm(formData, mitigationPatchSchema);
  if (submission.status !== "success") return data(submission.reply(), { status: 400 });
  try {
    await requireAssessment(scopeOf(member), params.assessmentId, params.siteId);
    if (adding) await addSign(actorOf(member), params.assessmentId, submission.value as never);
    else await updateMitigation(actorOf(member), params.assessmentId, submission.value as never);
    return redirectWithFlash(`/sites/${params.siteId}/assessments/${params.assessmentId}#plan`, { kind: "success", message: adding ? "Sign added to the plan." : "Mitigation plan saved." });
  } catch (error) {
    return domainErrorReply(error, submission);
  }
}

export default function Assessment({ loaderData, actionData }: Route.ComponentProps) {
  const { view, canEdit } = loaderData;
  const o = view.options;
  const std = view.standard as StandardId;
  const labelOf = (id: string) => id;
  const surfaceName = (id: string) => view.surfaces.find((s) => s.surfaceId === id)?.name ?? id;
  return (
    <article aria-labelledby="assessment-title" className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div className="min-w-0">
          <p className="text-sm text-graphite-600"><Link to={`/sites/${view.siteId}/assessments`} className="underline">Assessments</Link> / frozen</p>
          <h2 id="assessment-title" className="text-xl font-semibold break-words">{view.name}</h2>
          <p className="text-sm text-graphite-600">Frozen <DateText value={view.createdAt} /> by <span className="break-words">{view.authorName}</span>; later edits of the site do not change it.</p>
        </div>
        <a href={`/api/v1/assessments/${view.id}`} className="link text-sm">The assessment as JSON (requests and responses)</a>
      </div>
      <TitleBlock
        label="Assessment basis"
        cells={[
          { label: "Site", value: view.siteName },
          { label: "Client", value: view.clientName ?? "—" },
          { label: "Standard", value: standardLabels[std] ?? view.standard },
          { label: "Tier", value: tierLabels[std]?.[view.tier as "general"] ?? view.tier },
          { label: "Evaluation", value: `${describeHeights(o)}; grid ${o.gridStepM} m; reflection factor ${o.reflectionFactor}` },
        ]}
      />
      <RfCautions />
      <Card title="Worst point">
        {view.summary.worstAt ? (
          <p className="text-base">
            <span className="figures text-2xl font-bold">{figure(view.summary.worstPercent)} %</span> of the {view.tier === "general" ? "general-population" : "occupational"} limit, at x = {view.summary.worstAt.x} m, y = {view.summary.worstAt.y} m, z = {view.summary.worstAt.z} m on {surfaceName(view.summary.worstAt.surfaceId)}.
          </p>
        ) : (
          <p>No emitter was on air, so nothing was evaluated.</p>
        )}
        {view.inactive.length ? <p className="mt-2 text-sm text-graphite-600">Switched off and left out: {view.inactive.join(", ")}.</p> : null}
        <p className="mt-2 text-xs text-graphite-500">Engine {view.engine}.</p>
      </Card>
      <AssessmentTables view={view} />
      <section aria-labelledby="maps-title" className="space-y-3">
        <h3 id="maps-title" className="text-lg font-semibold">Areas by class, with the plan's signs and barriers</h3>
        <ClassLegend />
        <div className="grid gap-4 lg:grid-cols-2">
          {view.surfaces.filter((s) => s.map).map((s) => (
            <figure key={s.surfaceId} className="space-y-1">
              <figcaption className="text-sm font-medium break-words">{s.name} <span className="text-graphite-600">({(s.elevationM ?? 0) >= 0 ? "+" : "−"}{Math.abs(s.elevationM ?? 0).toFixed(1)} m)</span></figcaption>
              <ClassMap name={s.name} {...s.map!} obstructions={s.obstructions} accessPoints={view.accessPoints.filter((a) => Math.abs(a.z - (s.elevationM ?? 0)) < 0.5)} signs={view.mitigation.signs.filter((g) => g.surfaceId === s.surfaceId || (g.surfaceId === null && Math.abs(g.z - (s.elevationM ?? 0)) < 0.5))} barriers={view.mitigation.barriers.filter((b) => b.surfaceId === s.surfaceId)} />
            </figure>
          ))}
        </div>
      </section>
      <section id="plan" aria-labelledby="plan-title" className="space-y-3">
        <h3 id="plan-title" className="text-lg font-semibold">Mitigation plan</h3>
        <MitigationEditor plan={view.mitigation} version={view.mitigationVersion} canEdit={canEdit} result={actionData} labelOf={labelOf} surfaces={view.surfaces.filter((s) => s.map).map((s) => ({ id: s.surfaceId, name: s.name }))} />
      </section>
    </article>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
