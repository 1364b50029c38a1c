// GET /api/v1/sites/:id/visits (newest first, with photo and reading counts)  ·  POST /api/v1/sites/:id/visits → 201 { visit }
import { requireApiMember } from "~/features/auth/guard.server";
import { actorOf, scopeOf } from "~/features/sites/scope.server";
import { findSite } from "~/features/sites/sites.server";
import { visitJson } from "~/features/visits/json";
import { visitCreateSchema } from "~/features/visits/schemas";
import { createVisit, listVisits } from "~/features/visits/visits.server";
import { api, apiError, methodNotAllowed, readJson } from "~/lib/api.server";
import { inventoryEditors, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/site-visits";

export async function loader({ request, params }: Route.LoaderArgs) {
  const member = await requireApiMember(request, { roles: staffRoles });
  const site = await findSite(scopeOf(member), params.siteId);
  if (!site) return apiError(404, "No such site.");
  const rows = await listVisits(site.id);
  return Response.json({ visits: rows.map((r) => visitJson(r.visit, { photoCount: r.photoCount, readingCount: r.readingCount })) });
}

export async function action({ request, params }: Route.ActionArgs) {
  if (request.method !== "POST") return methodNotAllowed("GET, POST");
  const member = await requireApiMember(request, { roles: inventoryEditors });
  return api(async () => {
    const input = await readJson(request, visitCreateSchema);
    const visit = await createVisit(actorOf(member), params.siteId, input);
    return Response.json({ visit: visitJson(visit, { photoCount: 0, readingCount: 0 }) }, { status: 201 });
  });
}
