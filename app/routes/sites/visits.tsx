import { createColumnHelper } from "@tanstack/react-table";
import { Link } from "react-router";
import { ButtonLink } from "~/components/button";
import { TableShell } from "~/components/table-shell";
import { requireMember } from "~/features/auth/guard.server";
import { scopeOf } from "~/features/sites/scope.server";
import { findSiteForRequest } from "~/features/sites/sites.server";
import { calibrationWarnings } from "~/features/visits/calibration";
import { listVisits } from "~/features/visits/visits.server";
import { formatDate } from "~/lib/dates";
import { found } from "~/lib/responses.server";
import { canEditInventory, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/visits";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: staffRoles });
  const site = found(await findSiteForRequest({ request, context }, scopeOf(member), params.siteId), "No such site in your organisation.");
  const rows = await listVisits(site.id);
  return {
    siteId: site.id,
    canEdit: canEditInventory(member.role),
    visits: rows.map(({ visit: v, photoCount, readingCount }) => ({
      id: v.id,
      visitedOn: v.visitedOn,
      people: v.people,
      conditions: v.conditions,
      photoCount,
      readingCount,
      warnings: calibrationWarnings(v.visitedOn, v.instruments).length,
    })),
  };
}

type Row = Route.ComponentProps["loaderData"]["visits"][number];
const column = createColumnHelper<Row>();

export default function Visits({ loaderData }: Route.ComponentProps) {
  const { siteId, canEdit, visits } = loaderData;
  const columns = [
    column.accessor("visitedOn", {
      header: "Date",
      cell: (c) => (
        <Link to={`/sites/${siteId}/visits/${c.row.original.id}`} className="font-medium whitespace-nowrap text-ink-900 underline decoration-rule underline-offset-2 hover:decoration-graphite-600">
          {formatDate(c.getValue())}
        </Link>
      ),
    }),
    column.accessor("people", { header: "People", cell: (c) => <span className="line-clamp-2 break-words">{c.getValue() || "—"}</span> }),
    column.accessor("conditions", { header: "Conditions", cell: (c) => <span className="line-clamp-2 break-words">{c.getValue() || "—"}</span> }),
    column.accessor("photoCount", { header: "Photos", cell: (c) => <span className="tabular-nums">{c.getValue()}</span> }),
    column.accessor("readingCount", { header: "Readings", cell: (c) => <span className="tabular-nums">{c.getValue()}</span> }),
    column.accessor("warnings", {
      header: "Calibration",
      cell: (c) => (c.getValue() ? <span className="whitespace-nowrap rounded bg-caution-100 px-1.5 py-0.5 text-xs text-caution-700">{c.getValue()} to check</span> : <span className="text-graphite-500">in date</span>),
    }),
  ];
  return (
    <section aria-labelledby="visits-title" className="space-y-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h2 id="visits-title" className="text-lg font-semibold">
            Visits
          </h2>
          <p className="text-sm text-graphite-600">Site surveys, newest first: who went, the instruments, photos and field readings.</p>
        </div>
        {canEdit ? (
          <ButtonLink to={`/sites/${siteId}/visits/new`} tone="primary">
            New visit
          </ButtonLink>
        ) : null}
      </div>
      <TableShell caption="Visits" columns={columns} rows={visits} empty={canEdit ? "No visits yet. Record the first survey with “New visit”." : "No visits recorded yet."} />
    </section>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
