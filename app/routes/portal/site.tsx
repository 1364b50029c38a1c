// /portal/sites/:siteId: one of the client's sites: where not to go (from the latest issued
// assessment, with a map of the keep-out areas), and every issued document to download.
// Another client's or organisation's site is 404; drafts never show.
import { RfCautions } from "~/components/cautions";
import { DateText } from "~/components/date-text";
import { Card, EmptyState, PageHeader } from "~/components/panels";
import { TextLink } from "~/components/text-link";
import { ClassLegend, ClassMap } from "~/features/assessments/class-map";
import { requireMember } from "~/features/auth/guard.server";
import { kindLabels } from "~/features/documents/labels";
import { portalSite } from "~/features/portal/portal.server";
import { BasisLine, StatusDetail } from "~/features/portal/status-panel";
import { scopeOf } from "~/features/sites/scope.server";
import { siteKindLabels, type SiteKind } from "~/features/sites/kinds";
import { found } from "~/lib/responses.server";
import type { Route } from "./+types/site";

export const meta: Route.MetaFunction = ({ data }) => [{ title: `${data?.site.name ?? "Site"} · Isotrope` }];

export async function loader(args: Route.LoaderArgs) {
  const member = await requireMember(args, { roles: ["client"] });
  return found(await portalSite(scopeOf(member), args.params.siteId), "No such site among yours.");
}

export default function PortalSite({ loaderData }: Route.ComponentProps) {
  const { site, status, basis, maps, documents } = loaderData;
  return (
    <>
      <p className="mb-3 text-sm">
        <TextLink to="/portal">← Your sites</TextLink>
      </p>
      <PageHeader title={site.name} label={[siteKindLabels[site.kind as SiteKind], site.clientName].filter(Boolean).join(" · ")}>
        {[site.address, site.city].filter(Boolean).join(", ") || null}
      </PageHeader>
      <div className="space-y-6">
        <Card title="Where it is safe to go">
          {status && basis ? (
            <div className="space-y-4">
              <StatusDetail status={status} />
              <BasisLine basis={basis} />
            </div>
          ) : (
            <EmptyState title="No issued assessment yet">The status shows here once a document for this site is issued.</EmptyState>
          )}
        </Card>
        {maps.length ? (
          <Card title="Map of the areas to keep out of">
            <p className="mb-3 text-sm text-graphite-600">Seen from above, north up. Shaded cells are above the public limit; darker means stronger.</p>
            <div className="grid gap-6 lg:grid-cols-2">
              {maps.map((m) => (
                <figure key={m.surfaceId} className="space-y-1">
                  <figcaption className="text-sm font-medium [overflow-wrap:anywhere]">{m.name}</figcaption>
                  <ClassMap name={m.name} polygon={m.polygon} grid={m.grid} classes={m.classes} obstructions={m.obstructions} accessPoints={m.accessPoints} signs={m.signs} barriers={m.barriers} width={520} />
                </figure>
              ))}
            </div>
            <div className="mt-3">
              <ClassLegend />
            </div>
          </Card>
        ) : null}
        <Card title="Issued documents">
          {documents.length === 0 ? (
            <EmptyState title="No documents issued yet" />
          ) : (
            <ul className="divide-y divide-rule border-y border-rule">
              {documents.map((d) => (
                <li key={d.id} className="flex flex-wrap items-center justify-between gap-x-4 gap-y-2 py-3">
                  <div className="min-w-0">
                    <p className="font-medium text-ink-900">
                      {kindLabels[d.kind]}, version {d.version}
                      {d.latest ? null : <span className="ml-2 text-sm font-normal text-graphite-600">(an earlier one)</span>}
                    </p>
                    <p className="text-sm text-graphite-600">
                      {d.issuedAt ? (
                        <>
                          Issued <DateText value={d.issuedAt} />
                        </>
                      ) : null}
                      {d.issuedBy ? ` by ${d.issuedBy}` : ""}
                      {d.code ? (
                        <>
                          {" · verification code "}
                          <TextLink to={`/verify/${d.code}`} className="figures">
                            {d.code}
                          </TextLink>
                        </>
                      ) : null}
                    </p>
                  </div>
                  <div className="text-sm">
                    <a className="link" href={`/documents/${d.id}/pdf`} download>
                      Download PDF
                    </a>
                  </div>
                </li>
              ))}
            </ul>
          )}
        </Card>
        <RfCautions />
      </div>
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
