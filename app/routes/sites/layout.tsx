import { requireMember } from "~/features/auth/guard.server";
import { itemsFromLayout } from "~/features/layout/editor-state";
import { readLayout } from "~/features/layout/layout.server";
import { LevelList } from "~/features/layout/level-list";
import { SitePlan } from "~/features/layout/site-plan";
import { EmitterLayer, OperatorLegend } from "~/features/emitters/emitter-layer";
import { planEmitters } from "~/features/emitters/section.server";
import { scopeOf } from "~/features/sites/scope.server";
import { findSiteForRequest } from "~/features/sites/sites.server";
import { ButtonLink } from "~/components/button";
import { found } from "~/lib/responses.server";
import { canEditInventory, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/layout";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: staffRoles });
  const site = found(await findSiteForRequest({ request, context }, scopeOf(member), params.siteId), "No such site in your organisation.");
  const [layout, emitters] = await Promise.all([readLayout(site.id, site.version), planEmitters(site.id)]);
  return { siteId: site.id, siteName: site.name, ...layout, emitters, canEdit: canEditInventory(member.role) };
}

export default function LayoutSection({ loaderData }: Route.ComponentProps) {
  const { siteId, siteName, surfaces, obstructions, accessPoints, backdrop, emitters, canEdit } = loaderData;
  const items = itemsFromLayout(loaderData);
  return (
    <section aria-labelledby="layout-title" className="space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="layout-title" className="text-lg font-semibold">
          Layout
        </h2>
        {canEdit ? (
          <ButtonLink to={`/sites/${siteId}/layout`} size="sm">
            Edit layout
          </ButtonLink>
        ) : null}
      </div>
      <OperatorLegend emitters={emitters} />
      <div className="grid gap-5 lg:grid-cols-[minmax(0,1fr)_18rem]">
        <SitePlan
          title={`Plan of ${siteName}`}
          surfaces={surfaces}
          obstructions={obstructions}
          accessPoints={accessPoints}
          backdrop={backdrop}
          extraPoints={emitters.map((e) => [e.x, e.y] as [number, number])}
        >
          {(frame) => <EmitterLayer frame={frame} emitters={emitters} />}
        </SitePlan>
        <div className="min-w-0 rounded-sheet border border-rule bg-sheet p-4">
          <LevelList items={items} />
        </div>
      </div>
    </section>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
