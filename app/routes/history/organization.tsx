import { Form, Link } from "react-router";
import { PageHeader } from "~/components/panels";
import { requireMember } from "~/features/auth/guard.server";
import { HistoryList } from "~/features/history/history-list";
import { historyActors, organizationHistory, referencedNames } from "~/features/history/history.server";
import { readPaging } from "~/lib/paging";
import type { Route } from "./+types/organization";

export const meta: Route.MetaFunction = () => [{ title: "History · Isotrope" }];

const entities = [
  ["site", "Sites"],
  ["client", "Clients"],
  ["surface", "Surfaces"],
  ["emitter", "Emitters"],
  ["pattern", "Antenna patterns"],
  ["visit", "Visits"],
  ["photo", "Photos"],
  ["reading", "Readings"],
  ["member", "Members"],
  ["invitation", "Invitations"],
] as const;

function dateParam(value: string | null, endOfDay = false) {
  if (!value || !/^\d{4}-\d{2}-\d{2}$/.test(value)) return null;
  const date = new Date(`${value}T00:00:00Z`);
  if (Number.isNaN(date.getTime())) return null;
  return endOfDay ? new Date(date.getTime() + 86_400_000) : date;
}

export async function loader({ request, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: ["owner"] });
  const params = new URL(request.url).searchParams;
  const { page, pageSize } = readPaging(params, 50);
  const entity = entities.some(([k]) => k === params.get("entity")) ? params.get("entity") : null;
  const actor = params.get("actor")?.slice(0, 64) || null;
  const from = params.get("from");
  const to = params.get("to");
  const [{ events, total }, actors] = await Promise.all([
    organizationHistory(member.organizationId, { entity, actorUserId: actor, from: dateParam(from), to: dateParam(to, true), page, pageSize }),
    historyActors(member.organizationId),
  ]);
  const names = await referencedNames(member.organizationId, events);
  return { events, names, total, page, pageSize, actors, filter: { entity, actor, from: dateParam(from) ? from : "", to: dateParam(to) ? to : "" } };
}

export default function OrganizationHistory({ loaderData }: Route.ComponentProps) {
  const { events, names, total, page, pageSize, actors, filter } = loaderData;
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const link = (p: number) => `?${new URLSearchParams({ ...Object.fromEntries(Object.entries(filter).filter(([, v]) => v)), page: String(p) } as Record<string, string>)}`;
  return (
    <>
      <PageHeader title="History">Every change anyone in your organisation made, newest first.</PageHeader>
      <Form method="get" className="mb-4 flex flex-wrap items-end gap-3 text-sm">
        <label className="flex flex-col gap-1">
          <span className="font-medium text-ink-700">Records</span>
          <select name="entity" defaultValue={filter.entity ?? ""} className="rounded-control border border-rule bg-white px-2 py-2">
            <option value="">All</option>
            {entities.map(([k, label]) => (
              <option key={k} value={k}>
                {label}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1">
          <span className="font-medium text-ink-700">By</span>
          <select name="actor" defaultValue={filter.actor ?? ""} className="max-w-56 rounded-control border border-rule bg-white px-2 py-2">
            <option value="">Anyone</option>
            {actors.map((a) => (
              <option key={a.id} value={a.id}>
                {a.name}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1">
          <span className="font-medium text-ink-700">From</span>
          <input type="date" name="from" defaultValue={filter.from ?? ""} className="rounded-control border border-rule bg-white px-2 py-1.5" />
        </label>
        <label className="flex flex-col gap-1">
          <span className="font-medium text-ink-700">To</span>
          <input type="date" name="to" defaultValue={filter.to ?? ""} className="rounded-control border border-rule bg-white px-2 py-1.5" />
        </label>
        <button type="submit" className="rounded-control bg-white px-3 py-2 font-medium ring-1 ring-rule hover:bg-paper">
          Show
        </button>
      </Form>
      <HistoryList
        events={events}
        names={names}
        empty="Nothing matches these filters."
        context={(e) =>
          e.siteId ? (
            <Link to={`/sites/${e.siteId}/history`} className="text-graphite-600 underline">
              (site)
            </Link>
          ) : null
        }
      />
      {pages > 1 ? (
        <nav aria-label="Pages" className="mt-4 flex items-center gap-3 text-sm">
          {page > 1 ? <Link to={link(page - 1)} className="underline">Newer</Link> : null}
          <span className="tabular-nums text-graphite-600">
            Page {page} of {pages} · {total} events
          </span>
          {page < pages ? <Link to={link(page + 1)} className="underline">Older</Link> : null}
        </nav>
      ) : null}
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
