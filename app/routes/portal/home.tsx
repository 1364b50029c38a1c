// /portal: a client member's home. Its client's sites, each with its current status and the latest
// issued document of each kind. Client members only; staff work in the consultancy's own pages.
import { Link } from "react-router";
import { RfCautions } from "~/components/cautions";
import { DateText } from "~/components/date-text";
import { Card, EmptyState, PageHeader } from "~/components/panels";
import { requireMember } from "~/features/auth/guard.server";
import { kindLabels } from "~/features/documents/labels";
import { portalSites } from "~/features/portal/portal.server";
import { BasisLine, StatusBadge } from "~/features/portal/status-panel";
import { scopeOf } from "~/features/sites/scope.server";
import { siteKindLabels, type SiteKind } from "~/features/sites/kinds";
import type { Route } from "./+types/home";

export const meta: Route.MetaFunction = () => [{ title: "Your sites · Isotrope" }];

export async function loader(args: Route.LoaderArgs) {
  const member = await requireMember(args, { roles: ["client"] });
  const sites = await portalSites(scopeOf(member));
  return { organizationName: member.organizationName, bound: member.clientId !== null, sites };
}

export default function PortalHome({ loaderData }: Route.ComponentProps) {
  const { organizationName, bound, sites } = loaderData;
  return (
    <>
      <PageHeader title="Your sites" label={`Prepared by ${organizationName}`}>
        Each site's radio-frequency safety status and the documents issued for it.
      </PageHeader>
      <div className="space-y-6">
        {sites.length === 0 ? (
          <EmptyState title={bound ? "No sites yet" : "Your account is not linked to a client yet"}>
            {bound ? "Sites appear here once they are recorded for you." : `Ask ${organizationName} to link your account to your company.`}
          </EmptyState>
        ) : (
          <ul className="grid gap-6 md:grid-cols-2">
            {sites.map((s) => (
              <li key={s.id} className="min-w-0">
                <Card
                  title={
                    <Link to={`/portal/sites/${s.id}`} className="link [overflow-wrap:anywhere]">
                      {s.name}
                    </Link>
                  }
                  actions={<span className="label-caps">{[siteKindLabels[s.kind as SiteKind], s.city].filter(Boolean).join(" · ")}</span>}
                >
                  <div className="space-y-3">
                    <StatusBadge status={s.status} />
                    {s.basis ? <BasisLine basis={s.basis} /> : <p className="text-sm text-graphite-600">Documents appear here once they are issued.</p>}
                    {s.documents.length ? (
                      <ul className="divide-y divide-rule border-y border-rule text-sm">
                        {s.documents.map((d) => (
                          <li key={d.id} className="flex flex-wrap items-baseline justify-between gap-x-3 py-2">
                            <span>
                              <span className="font-medium text-ink-900">{kindLabels[d.kind]}</span>
                              <span className="text-graphite-600">
                                , version {d.version}
                                {d.issuedAt ? (
                                  <>
                                    , issued <DateText value={d.issuedAt} />
                                  </>
                                ) : null}
                              </span>
                            </span>
                            <a className="link" href={`/documents/${d.id}/pdf`} download>
                              Download PDF
                            </a>
                          </li>
                        ))}
                      </ul>
                    ) : null}
                    <p>
                      <Link to={`/portal/sites/${s.id}`} className="link">
                        Status, map and every document
                      </Link>
                    </p>
                  </div>
                </Card>
              </li>
            ))}
          </ul>
        )}
        <RfCautions />
      </div>
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
