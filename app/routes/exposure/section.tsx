import { RfCautions } from "~/components/cautions";
import { requireMember } from "~/features/auth/guard.server";
import { SectionView } from "~/features/exposure/section-view";
import { ViewHeader } from "~/features/exposure/view-header";
import { loadViewData } from "~/features/exposure/view-data.server";
import { scopeOf } from "~/features/sites/scope.server";
import { staffRoles } from "~/lib/roles";
import type { Route } from "./+types/section";

export const meta: Route.MetaFunction = ({ data }) => [{ title: data ? `Elevation view · ${data.site.name} · Isotrope` : "Elevation view · Isotrope" }];

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: staffRoles });
  return loadViewData(scopeOf(member), params.siteId, new URL(request.url));
}

export default function SectionPage({ loaderData }: Route.ComponentProps) {
  const { site, options, optionErrors, emitters, surfaces, obstructions } = loaderData;
  return (
    <section aria-labelledby="view-title" className="space-y-6">
      <ViewHeader title="Elevation view" siteName={site.name} options={options} optionErrors={optionErrors} />
      <SectionView emitters={emitters} surfaces={surfaces} obstructions={obstructions} options={options} />
      <RfCautions />
    </section>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
