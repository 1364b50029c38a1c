import { Link } from "react-router";
import { RfCautions } from "~/components/cautions";
import { DateText } from "~/components/date-text";
import { compareById } from "~/features/assessments/assessments.server";
import { ClassLegend, ClassMap } from "~/features/assessments/class-map";
import { ComparisonTables } from "~/features/assessments/comparison-tables";
import { assessmentView } from "~/features/assessments/view";
import { requireMember } from "~/features/auth/guard.server";
import { scopeOf } from "~/features/sites/scope.server";
import { DomainError } from "~/lib/domain-error";
import { found } from "~/lib/responses.server";
import { staffRoles } from "~/lib/roles";
import { data } from "react-router";
import type { Route } from "./+types/assessment-compare";

export const meta: Route.MetaFunction = () => [{ title: "Compare assessments · Isotrope" }];

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: staffRoles });
  let compared;
  try {
    compared = await compareById(scopeOf(member), params.a, params.b);
  } catch (error) {
    if (error instanceof DomainError) throw data({ message: error.message }, { status: error.status });
    throw error;
  }
  const { a, b, comparison } = compared;
  found(a.siteId === params.siteId ? a : null, "These assessments are not of this site.");
  const side = (row: typeof a) => {
    const v = assessmentView(row);
    return { id: v.id, name: v.name, createdAt: v.createdAt, authorName: v.authorName, worstPercent: v.summary.worstPercent, maps: v.surfaces.filter((s) => s.map).map((s) => ({ surfaceId: s.surfaceId, name: s.name, map: s.map!, obstructions: s.obstructions })) };
  };
  return { siteId: params.siteId, a: side(a), b: side(b), comparison };
}

export default function Compare({ loaderData }: Route.ComponentProps) {
  const { siteId, a, b, comparison } = loaderData;
  const surfaceIds = [...new Set([...a.maps.map((m) => m.surfaceId), ...b.maps.map((m) => m.surfaceId)])];
  return (
    <article aria-labelledby="compare-title" className="space-y-6">
      <div>
        <p className="text-sm text-graphite-600"><Link to={`/sites/${siteId}/assessments`} className="underline">Assessments</Link> / compare</p>
        <h2 id="compare-title" className="text-xl font-semibold">Compare two assessments</h2>
        <dl className="mt-2 grid gap-2 text-sm sm:grid-cols-2">
          {[["A (before)", a], ["B (after)", b]].map(([label, s]) => {
            const side = s as typeof a;
            return (
              <div key={label as string} className="rounded-sheet border border-rule bg-sheet p-3">
                <dt className="label-caps">{label as string}</dt>
                <dd className="mt-1 break-words"><Link className="link font-medium" to={`/sites/${siteId}/assessments/${side.id}`}>{side.name}</Link>, frozen <DateText value={side.createdAt} /> by {side.authorName}</dd>
              </div>
            );
          })}
        </dl>
        <p className="mt-2 text-sm"><a className="link" href={`/api/v1/assessments/${a.id}/compare/${b.id}`}>The comparison as JSON</a></p>
      </div>
      <RfCautions />
      <ComparisonTables comparison={comparison} />
      <section aria-labelledby="maps-title" className="space-y-3">
        <h3 id="maps-title" className="text-lg font-semibold">Areas by class, side by side</h3>
        <ClassLegend />
        {surfaceIds.map((id) => {
          const [ma, mb] = [a.maps.find((m) => m.surfaceId === id), b.maps.find((m) => m.surfaceId === id)];
          return (
            <div key={id} className="space-y-1">
              <h4 className="text-sm font-medium break-words">{mb?.name ?? ma?.name}</h4>
              <div className="grid gap-3 sm:grid-cols-2">
                {[["A", ma], ["B", mb]].map(([label, m]) => {
                  const map = m as typeof ma;
                  return (
                    <figure key={label as string}>
                      <figcaption className="text-xs text-graphite-600">{label as string}</figcaption>
                      {map ? <ClassMap name={`${map.name} (${label as string})`} {...map.map} obstructions={map.obstructions} width={480} /> : <p className="text-sm text-graphite-600">Not in this assessment.</p>}
                    </figure>
                  );
                })}
              </div>
            </div>
          );
        })}
      </section>
    </article>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
