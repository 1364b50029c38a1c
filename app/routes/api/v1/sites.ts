// GET /api/v1/sites?page=&pageSize=&q=&kind=&clientId=  ·  POST /api/v1/sites
import { requireApiMember } from "~/features/auth/guard.server";
import { siteJson } from "~/features/sites/json";
import { siteKinds, type SiteKind } from "~/features/sites/kinds";
import { siteCreateSchema } from "~/features/sites/schemas";
import { actorOf, scopeOf } from "~/features/sites/scope.server";
import { createSite, listSites, siteSortKeys } from "~/features/sites/sites.server";
import { api, methodNotAllowed, readJson } from "~/lib/api.server";
import { readPaging, readSort } from "~/lib/paging";
import { inventoryEditors, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/sites";

export async function loader({ request, context }: Route.LoaderArgs) {
  const member = await requireApiMember({ request, context }, { roles: staffRoles });
  const params = new URL(request.url).searchParams;
  const paging = readPaging(params);
  const { sort, dir } = readSort(params, siteSortKeys, "name");
  const kind = params.get("kind");
  const { sites, total } = await listSites(scopeOf(member), {
    ...paging,
    sort,
    dir,
    kind: siteKinds.includes(kind as SiteKind) ? (kind as SiteKind) : null,
    clientId: params.get("clientId")?.slice(0, 64) || null,
  });
  return Response.json({
    sites: sites.map((s) => ({ id: s.id, name: s.name, kind: s.kind, city: s.city, clientId: s.clientId, emitterCount: s.emitterCount, updatedAt: s.updatedAt.toISOString() })),
    total,
    page: paging.page,
    pageSize: paging.pageSize,
  });
}

export async function action({ request, context }: Route.ActionArgs) {
  if (request.method !== "POST") return methodNotAllowed("GET, POST");
  const member = await requireApiMember({ request, context }, { roles: inventoryEditors });
  return api(async () => {
    const input = await readJson(request, siteCreateSchema);
    const site = await createSite(actorOf(member), input);
    return Response.json({ site: siteJson(site) }, { status: 201 });
  });
}
