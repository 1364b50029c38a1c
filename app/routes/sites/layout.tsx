import { asc, eq } from "drizzle-orm";
import { requireMember } from "~/features/auth/guard.server";
import { SitePlan } from "~/features/layout/site-plan";
import { EmitterLayer, OperatorLegend } from "~/features/emitters/emitter-layer";
import { planEmitters } from "~/features/emitters/section.server";
import { scopeOf } from "~/features/sites/scope.server";
import { findSite } from "~/features/sites/sites.server";
import { db, schema } from "~/infra/db.server";
import { found } from "~/lib/responses.server";
import { staffRoles } from "~/lib/roles";
import type { Route } from "./+types/layout";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: staffRoles });
  const site = found(await findSite(scopeOf(member), params.siteId), "No such site in your organisation.");
  const [surfaces, obstructions, accessPoints] = await Promise.all([
    db.select().from(schema.surface).where(eq(schema.surface.siteId, site.id)).orderBy(asc(schema.surface.position)),
    db.select().from(schema.obstruction).where(eq(schema.obstruction.siteId, site.id)).orderBy(asc(schema.obstruction.position)),
    db.select().from(schema.accessPoint).where(eq(schema.accessPoint.siteId, site.id)).orderBy(asc(schema.accessPoint.position)),
  ]);
  const emitters = await planEmitters(site.id);
  return { siteName: site.name, surfaces, obstructions, accessPoints, emitters };
}

export default function LayoutSection({ loaderData }: Route.ComponentProps) {
  const { siteName, surfaces, obstructions, accessPoints } = loaderData;
  const emitters = loaderData.emitters;
  return (
    <section aria-labelledby="layout-title" className="space-y-4">
      <h2 id="layout-title" className="text-lg font-semibold">
        Layout
      </h2>
      <OperatorLegend emitters={emitters} />
      <SitePlan title={`Plan of ${siteName}`} surfaces={surfaces} obstructions={obstructions} accessPoints={accessPoints} extraPoints={emitters.map((e) => [e.x, e.y] as [number, number])}>
        {(frame) => <EmitterLayer frame={frame} emitters={emitters} />}
      </SitePlan>
    </section>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
