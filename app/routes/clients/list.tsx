import { createColumnHelper } from "@tanstack/react-table";
import { Form, Link } from "react-router";
import { ButtonLink } from "~/components/button";
import { DataTable } from "~/components/data-table";
import { PageHeader } from "~/components/panels";
import { requireMember } from "~/features/auth/guard.server";
import { clientSortKeys, listClients } from "~/features/clients/clients.server";
import { scopeOf } from "~/features/sites/scope.server";
import { formatDate } from "~/lib/dates";
import { readPaging, readSort } from "~/lib/paging";
import { canEditInventory, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/list";

export const meta: Route.MetaFunction = () => [{ title: "Clients · Isotrope" }];

export async function loader({ request, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: staffRoles });
  const params = new URL(request.url).searchParams;
  const paging = readPaging(params);
  const { sort, dir } = readSort(params, clientSortKeys, "name");
  const { clients, total } = await listClients(scopeOf(member), { ...paging, sort, dir });
  return { clients, total, ...paging, sort, dir, canEdit: canEditInventory(member.role) };
}

type Row = Route.ComponentProps["loaderData"]["clients"][number];
const column = createColumnHelper<Row>();
const columns = [
  column.accessor("name", {
    header: "Client",
    meta: { sortKey: "name" },
    cell: (c) => (
      <Link to={`/clients/${c.row.original.id}`} className="font-medium text-ink-900 underline decoration-rule underline-offset-2 hover:decoration-graphite-600">
        {c.getValue()}
      </Link>
    ),
  }),
  column.accessor("siteCount", { header: "Sites", meta: { sortKey: "sites", align: "right" } }),
  column.accessor("contactCount", { header: "Contacts", meta: { align: "right" } }),
  column.accessor("updatedAt", { header: "Changed", meta: { sortKey: "updated" }, cell: (c) => formatDate(c.getValue()) }),
];

export default function Clients({ loaderData }: Route.ComponentProps) {
  const d = loaderData;
  return (
    <>
      <PageHeader title="Clients" actions={d.canEdit ? <ButtonLink to="/clients/new" tone="primary">New client</ButtonLink> : null}>
        Landlords and property companies you assess sites for.
      </PageHeader>
      <Form method="get" role="search" className="mb-4 flex flex-wrap items-end gap-3 text-sm">
        <label className="flex min-w-56 flex-1 flex-col gap-1">
          <span className="font-medium text-ink-700">Search</span>
          <input name="q" type="search" defaultValue={d.q} maxLength={100} placeholder="Client name" className="rounded-control border border-rule bg-white px-3 py-2" />
        </label>
        <input type="hidden" name="sort" value={d.sort} />
        <input type="hidden" name="dir" value={d.dir} />
        <button type="submit" className="rounded-control bg-white px-3 py-2 font-medium ring-1 ring-rule hover:bg-paper">
          Show
        </button>
        {d.q ? <Link to="/clients" className="py-2 text-graphite-600 underline">Clear</Link> : null}
      </Form>
      <DataTable
        caption="Clients"
        columns={columns}
        rows={d.clients}
        total={d.total}
        page={d.page}
        pageSize={d.pageSize}
        sort={d.sort}
        dir={d.dir}
        getRowId={(r) => r.id}
        empty={
          d.q ? (
            "No client matches that name."
          ) : d.canEdit ? (
            <>
              No clients yet. <Link to="/clients/new" className="underline">Add the first landlord or property company</Link>, then record its sites.
            </>
          ) : (
            "No clients yet."
          )
        }
      />
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
