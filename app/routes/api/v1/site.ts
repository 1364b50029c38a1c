// GET, PATCH (with the version read; stale → 409) and DELETE /api/v1/sites/:id
import { requireApiMember } from "~/features/auth/guard.server";
import { siteDetail } from "~/features/sites/detail.server";
import { siteJson } from "~/features/sites/json";
import { sitePatchSchema } from "~/features/sites/schemas";
import { actorOf, scopeOf } from "~/features/sites/scope.server";
import { deleteSite, updateSite } from "~/features/sites/sites.server";
import { api, apiError, methodNotAllowed, readJson } from "~/lib/api.server";
import { inventoryEditors, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/site";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireApiMember({ request, context }, { roles: staffRoles });
  const site = await siteDetail(scopeOf(member), params.siteId);
  if (!site) return apiError(404, "No such site.");
  return Response.json({ site });
}

export async function action({ request, params, context }: Route.ActionArgs) {
  if (request.method !== "PATCH" && request.method !== "DELETE") return methodNotAllowed("GET, PATCH, DELETE");
  const member = await requireApiMember({ request, context }, { roles: inventoryEditors });
  return api(async () => {
    if (request.method === "DELETE") {
      await deleteSite(actorOf(member), params.siteId);
      return new Response(null, { status: 204 });
    }
    const patch = await readJson(request, sitePatchSchema);
    const site = await updateSite(actorOf(member), params.siteId, patch);
    return Response.json({ site: siteJson(site) });
  });
}
