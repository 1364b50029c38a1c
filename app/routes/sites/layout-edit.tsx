// /sites/:siteId/layout: the layout editor (areas, facades, obstructions, access points, roof drawing).
// Saves go to PUT /api/v1/sites/:siteId/surfaces, which checks the same rules again.
import { requireMember } from "~/features/auth/guard.server";
import { LayoutEditor } from "~/features/layout/layout-editor";
import { readLayout } from "~/features/layout/layout.server";
import { scopeOf } from "~/features/sites/scope.server";
import { findSiteForRequest } from "~/features/sites/sites.server";
import { found } from "~/lib/responses.server";
import { inventoryEditors } from "~/lib/roles";
import type { Route } from "./+types/layout-edit";

export const meta: Route.MetaFunction = ({ data }) => [{ title: data ? `Edit layout · ${data.siteName} · Isotrope` : "Edit layout · Isotrope" }];

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: inventoryEditors });
  const site = found(await findSiteForRequest({ request, context }, scopeOf(member), params.siteId), "No such site in your organisation.");
  return { siteId: site.id, siteName: site.name, layout: await readLayout(site.id, site.version) };
}

export default function LayoutEditPage({ loaderData }: Route.ComponentProps) {
  const { siteId, siteName, layout } = loaderData;
  return (
    <section aria-labelledby="layout-edit-title" className="space-y-4">
      <div>
        <h2 id="layout-edit-title" className="text-lg font-bold">
          Edit layout
        </h2>
        <p className="text-sm text-graphite-600">Site-local metres: x east, y north, z up from the site's datum. Points snap to 0.1 m when drawn.</p>
      </div>
      {/* A fresh editor for each saved version read from the server. */}
      <LayoutEditor key={`${siteId}-${layout.version}`} siteId={siteId} siteName={siteName} initial={layout} />
    </section>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
