import { createColumnHelper } from "@tanstack/react-table";
import { Form, Link } from "react-router";
import { ButtonLink } from "~/components/button";
import { DataTable } from "~/components/data-table";
import { PageHeader } from "~/components/panels";
import { requireMember } from "~/features/auth/guard.server";
import { clientOptions } from "~/features/clients/clients.server";
import { siteKindLabels, siteKinds, type SiteKind } from "~/features/sites/kinds";
import { scopeOf } from "~/features/sites/scope.server";
import { listSites, siteSortKeys } from "~/features/sites/sites.server";
import { formatDate } from "~/lib/dates";
import { readPaging, readSort } from "~/lib/paging";
import { canEditInventory, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/list";

export const meta: Route.MetaFunction = () => [{ title: "Sites · Isotrope" }];

export async function loader({ request, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: staffRoles });
  const params = new URL(request.url).searchParams;
  const paging = readPaging(params);
  const { sort, dir } = readSort(params, siteSortKeys, "name");
  const kindParam = params.get("kind");
  const kind = siteKinds.includes(kindParam as SiteKind) ? (kindParam as SiteKind) : null;
  const clientId = params.get("client")?.slice(0, 64) || null;
  const scope = scopeOf(member);
  const [{ sites, total }, clients] = await Promise.all([listSites(scope, { ...paging, kind, clientId, sort, dir }), clientOptions(scope)]);
  return { sites, total, ...paging, sort, dir, kind, clientId, clients, canEdit: canEditInventory(member.role) };
}

type Row = Route.ComponentProps["loaderData"]["sites"][number];
const column = createColumnHelper<Row>();
const columns = [
  column.accessor("name", {
    header: "Site",
    meta: { sortKey: "name" },
    cell: (c) => (
      <Link to={`/sites/${c.row.original.id}`} className="font-medium text-ink-900 underline decoration-rule underline-offset-2 hover:decoration-graphite-600">
        {c.getValue()}
      </Link>
    ),
  }),
  column.accessor("kind", { header: "Kind", meta: { sortKey: "kind" }, cell: (c) => siteKindLabels[c.getValue() as SiteKind] ?? c.getValue() }),
  column.accessor("city", { header: "City", meta: { sortKey: "city" } }),
  column.accessor("clientName", {
    header: "Client",
    meta: { sortKey: "client" },
    cell: (c) => (c.row.original.clientId ? <Link to={`/clients/${c.row.original.clientId}`} className="hover:underline">{c.getValue()}</Link> : <span className="text-graphite-500">—</span>),
  }),
  column.accessor("emitterCount", { header: "Emitters", meta: { sortKey: "emitters", align: "right" } }),
  column.accessor("updatedAt", { header: "Changed", meta: { sortKey: "updated" }, cell: (c) => formatDate(c.getValue()) }),
];

export default function Sites({ loaderData }: Route.ComponentProps) {
  const d = loaderData;
  const filtered = Boolean(d.q || d.kind || d.clientId);
  return (
    <>
      <PageHeader title="Sites" actions={d.canEdit ? <ButtonLink to="/sites/new" tone="primary">New site</ButtonLink> : null}>
        Every transmitter site your organisation records.
      </PageHeader>
      <Form method="get" role="search" className="mb-4 flex flex-wrap items-end gap-3 text-sm">
        <label className="flex min-w-56 flex-1 flex-col gap-1">
          <span className="font-medium text-ink-700">Search</span>
          <input name="q" type="search" defaultValue={d.q} maxLength={100} placeholder="Name, city or address" className="rounded-control border border-rule bg-white px-3 py-2" />
        </label>
        <label className="flex flex-col gap-1">
          <span className="font-medium text-ink-700">Kind</span>
          <select name="kind" defaultValue={d.kind ?? ""} className="rounded-control border border-rule bg-white px-2 py-2">
            <option value="">Any kind</option>
            {siteKinds.map((k) => (
              <option key={k} value={k}>
                {siteKindLabels[k]}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1">
          <span className="font-medium text-ink-700">Client</span>
          <select name="client" defaultValue={d.clientId ?? ""} className="max-w-64 rounded-control border border-rule bg-white px-2 py-2">
            <option value="">Any client</option>
            {d.clients.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name}
              </option>
            ))}
          </select>
        </label>
        <input type="hidden" name="sort" value={d.sort} />
        <input type="hidden" name="dir" value={d.dir} />
        <button type="submit" className="rounded-control bg-white px-3 py-2 font-medium ring-1 ring-rule hover:bg-paper">
          Show
        </button>
        {filtered ? (
          <Link to="/sites" className="py-2 text-graphite-600 underline">
            Clear
          </Link>
        ) : null}
      </Form>
      <DataTable
        caption="Sites"
        columns={columns}
        rows={d.sites}
        total={d.total}
        page={d.page}
        pageSize={d.pageSize}
        sort={d.sort}
        dir={d.dir}
        getRowId={(r) => r.id}
        empty={
          filtered ? (
            "No site matches. Clear the search or the filters."
          ) : d.canEdit ? (
            <>
              No sites yet. <Link to="/sites/new" className="underline">Record your first site</Link>: its address, its client and what z = 0 means there.
            </>
          ) : (
            "No sites yet. The engineers record them."
          )
        }
      />
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
