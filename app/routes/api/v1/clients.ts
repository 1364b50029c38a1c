// GET /api/v1/clients?page=&pageSize=&q=  ·  POST /api/v1/clients
import { requireApiMember } from "~/features/auth/guard.server";
import { clientSortKeys, createClient, findClient, listClients } from "~/features/clients/clients.server";
import { clientCreateSchema } from "~/features/clients/schemas";
import { actorOf, scopeOf } from "~/features/sites/scope.server";
import { api, methodNotAllowed, readJson } from "~/lib/api.server";
import { readPaging, readSort } from "~/lib/paging";
import { inventoryEditors, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/clients";

export async function loader({ request, context }: Route.LoaderArgs) {
  const member = await requireApiMember({ request, context }, { roles: staffRoles });
  const params = new URL(request.url).searchParams;
  const paging = readPaging(params);
  const { sort, dir } = readSort(params, clientSortKeys, "name");
  const { clients, total } = await listClients(scopeOf(member), { ...paging, sort, dir });
  return Response.json({
    clients: clients.map((c) => ({ id: c.id, name: c.name, siteCount: c.siteCount, contactCount: c.contactCount, updatedAt: c.updatedAt.toISOString() })),
    total,
    page: paging.page,
    pageSize: paging.pageSize,
  });
}

export async function action({ request, context }: Route.ActionArgs) {
  if (request.method !== "POST") return methodNotAllowed("GET, POST");
  const member = await requireApiMember({ request, context }, { roles: inventoryEditors });
  return api(async () => {
    const input = await readJson(request, clientCreateSchema);
    const created = await createClient(actorOf(member), input);
    const client = await findClient(scopeOf(member), created.id);
    return Response.json({ client }, { status: 201 });
  });
}
