import { requireMember } from "~/features/auth/guard.server";
import { HistoryList } from "~/features/history/history-list";
import { referencedNames, siteHistory } from "~/features/history/history.server";
import { scopeOf } from "~/features/sites/scope.server";
import { findSiteForRequest } from "~/features/sites/sites.server";
import { found } from "~/lib/responses.server";
import { staffRoles } from "~/lib/roles";
import type { Route } from "./+types/history";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: staffRoles });
  const site = found(await findSiteForRequest({ request, context }, scopeOf(member), params.siteId), "No such site in your organisation.");
  const events = await siteHistory(member.organizationId, site.id);
  return { events, names: await referencedNames(member.organizationId, events) };
}

export default function SiteHistory({ loaderData }: Route.ComponentProps) {
  return (
    <section aria-labelledby="history-title">
      <h2 id="history-title" className="mb-1 text-lg font-semibold">
        History
      </h2>
      <p className="mb-4 text-sm text-graphite-600">Every change to this site's details, layout, emitters, visits and readings, newest first.</p>
      <HistoryList events={loaderData.events} names={loaderData.names} empty="No changes recorded yet." />
    </section>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
