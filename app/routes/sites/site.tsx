import { Link, NavLink, Outlet, useLocation } from "react-router";
import { requireMember } from "~/features/auth/guard.server";
import { siteKindLabels, type SiteKind } from "~/features/sites/kinds";
import { scopeOf } from "~/features/sites/scope.server";
import { findSiteForRequest } from "~/features/sites/sites.server";
import { canEditInventory, staffRoles } from "~/lib/roles";
import { found } from "~/lib/responses.server";
import type { Route } from "./+types/site";

export const meta: Route.MetaFunction = ({ data }) => [{ title: data ? `${data.site.name} · Isotrope` : "Site · Isotrope" }];

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: staffRoles });
  const site = found(await findSiteForRequest({ request, context }, scopeOf(member), params.siteId), "No such site in your organisation.");
  return {
    site: { id: site.id, name: site.name, kind: site.kind as SiteKind, address: site.address, city: site.city, clientId: site.clientId, clientName: site.clientName, datumNote: site.datumNote, accessNotes: site.accessNotes },
    canEdit: canEditInventory(member.role),
  };
}

const sections: { to: string; label: string; end?: boolean; also?: string }[] = [
  { to: "", label: "Layout", end: true, also: "layout" },
  { to: "emitters", label: "Emitters" },
  { to: "visits", label: "Visits" },
  { to: "exposure", label: "Exposure" },
  { to: "assessments", label: "Assessments" },
  { to: "documents", label: "Documents" },
  { to: "history", label: "History" },
];

export default function SitePage({ loaderData }: Route.ComponentProps) {
  const { site, canEdit } = loaderData;
  const { pathname } = useLocation();
  const place = [site.address, site.city].filter(Boolean).join(", ");
  return (
    <>
      <header className="mb-5">
        <p className="text-sm text-graphite-600">
          <Link to="/sites" className="underline">
            Sites
          </Link>{" "}
          / {siteKindLabels[site.kind] ?? site.kind}
        </p>
        <div className="mt-1 flex flex-wrap items-start justify-between gap-3">
          <div className="min-w-0">
            <h1 className="text-2xl font-semibold tracking-tight break-words text-ink-900">{site.name}</h1>
            <p className="mt-1 text-sm break-words text-graphite-600">
              {place || "No address yet"}
              {site.clientId ? (
                <>
                  {" · "}
                  <Link to={`/clients/${site.clientId}`} className="underline">
                    {site.clientName}
                  </Link>
                </>
              ) : null}
              {site.datumNote ? ` · z = 0 at ${site.datumNote}` : ""}
            </p>
          </div>
          {canEdit ? (
            <Link to={`/sites/${site.id}/edit`} className="rounded-control bg-white px-3 py-1.5 text-sm font-medium ring-1 ring-rule hover:bg-paper">
              Edit details
            </Link>
          ) : null}
        </div>
        <nav aria-label="Site sections" className="mt-4 flex gap-1 overflow-x-auto border-b border-rule">
          {sections.map((s) => (
            <NavLink
              key={s.label}
              to={s.to ? `/sites/${site.id}/${s.to}` : `/sites/${site.id}`}
              end={s.end}
              className={({ isActive }) =>
                `-mb-px whitespace-nowrap border-b-2 px-3 py-2 text-sm ${isActive || (s.also && pathname === `/sites/${site.id}/${s.also}`) ? "border-ink-900 font-medium text-ink-900" : "border-transparent text-graphite-600 hover:text-ink-900"}`
              }
            >
              {s.label}
            </NavLink>
          ))}
        </nav>
      </header>
      <Outlet />
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
