// GET and PUT /api/v1/sites/:id/surfaces: the site's layout, replaced whole in one transaction.
import { requireApiMember } from "~/features/auth/guard.server";
import { layoutApi, readLayoutBody } from "~/features/layout/layout-api.server";
import { readLayout, saveLayout } from "~/features/layout/layout.server";
import { actorOf, scopeOf } from "~/features/sites/scope.server";
import { findSite } from "~/features/sites/sites.server";
import { apiError, methodNotAllowed } from "~/lib/api.server";
import { inventoryEditors, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/site-surfaces";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireApiMember({ request, context }, { roles: staffRoles });
  const site = await findSite(scopeOf(member), params.siteId);
  if (!site) return apiError(404, "No such site.");
  return Response.json(await readLayout(site.id, site.version));
}

export async function action({ request, params, context }: Route.ActionArgs) {
  if (request.method !== "PUT") return methodNotAllowed("GET, PUT");
  const member = await requireApiMember({ request, context }, { roles: inventoryEditors });
  return layoutApi(async () => {
    const input = await readLayoutBody(request);
    return Response.json(await saveLayout(actorOf(member), params.siteId, input));
  });
}
