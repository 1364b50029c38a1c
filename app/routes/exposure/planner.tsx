import { RfCautions } from "~/components/cautions";
import { requireMember } from "~/features/auth/guard.server";
import { PlannerView } from "~/features/exposure/planner-view";
import { ViewHeader } from "~/features/exposure/view-header";
import { loadViewData } from "~/features/exposure/view-data.server";
import { scopeOf } from "~/features/sites/scope.server";
import { staffRoles } from "~/lib/roles";
import type { Route } from "./+types/planner";

export const meta: Route.MetaFunction = ({ data }) => [{ title: data ? `Work-area planner · ${data.site.name} · Isotrope` : "Work-area planner · Isotrope" }];

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: staffRoles });
  return loadViewData(scopeOf(member), params.siteId, new URL(request.url));
}

export default function PlannerPage({ loaderData }: Route.ComponentProps) {
  const { site, options, optionErrors, emitters, emitterInfo, surfaces, obstructions, accessPoints } = loaderData;
  return (
    <section aria-labelledby="view-title" className="space-y-6">
      <ViewHeader title="Work-area planner" siteName={site.name} options={options} optionErrors={optionErrors} />
      <PlannerView emitters={emitters} emitterInfo={emitterInfo} surfaces={surfaces} obstructions={obstructions} accessPoints={accessPoints} options={options} />
      <RfCautions />
    </section>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
